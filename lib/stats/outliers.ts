// Outlier tests for the few drops timed on one ball.
import { studentTQuantile } from "./distributions";
import { checkProbability, checkValues, meanAndSd } from "./sample";

// Critical r10 values, Rorabacher (1991), Analytical Chemistry 63(2), Table, n = 3…10.
const DIXON: Record<string, readonly number[]> = {
  "0.9": [0.941, 0.765, 0.642, 0.56, 0.507, 0.468, 0.437, 0.412],
  "0.95": [0.97, 0.829, 0.71, 0.625, 0.568, 0.526, 0.493, 0.466],
  "0.99": [0.994, 0.926, 0.821, 0.74, 0.68, 0.634, 0.598, 0.568],
};

/**
 * Dixon's Q, r10 = gap/range, for the lowest and the highest value; the larger is reported.
 * Dixon (1950); critical values Rorabacher (1991).
 */
export function dixonQ(values: readonly number[], confidence: number): { q: number; critical: number; suspect: number; isOutlier: boolean } {
  checkValues(values, 3, "Dixon's Q test");
  if (values.length > 10) throw new Error("Dixon's Q test is tabulated here for 3 to 10 values only");
  const table = DIXON[String(confidence)];
  if (!table) throw new Error("Dixon's Q test is tabulated here for confidence 0.90, 0.95 or 0.99 only");
  const x = [...values].sort((a, b) => a - b);
  const n = x.length;
  const range = x[n - 1] - x[0];
  if (!(range > 0)) throw new Error("Dixon's Q test needs values that are not all equal");
  const low = (x[1] - x[0]) / range;
  const high = (x[n - 1] - x[n - 2]) / range;
  const critical = table[n - 3];
  const q = Math.max(low, high);
  return { q, critical, suspect: high >= low ? x[n - 1] : x[0], isOutlier: q > critical };
}

/**
 * Two-sided Grubbs test: G = max|x − mean|/s against ((n−1)/√n)·√(t²/(n−2+t²)),
 * t the upper α/(2n) quantile of Student t with n − 2 df. Grubbs (1969), as used in ISO 5725-2.
 * G can never exceed (n−1)/√n, so with three values the test can flag one only when the other two nearly coincide.
 */
export function grubbs(values: readonly number[], alpha: number): { g: number; critical: number; suspect: number; isOutlier: boolean } {
  checkValues(values, 3, "Grubbs' test");
  checkProbability(alpha, "alpha");
  const n = values.length;
  const { mean, sd } = meanAndSd(values);
  if (!(sd > 0)) throw new Error("Grubbs' test needs values that are not all equal");
  let suspect = values[0];
  for (const v of values) if (Math.abs(v - mean) > Math.abs(suspect - mean)) suspect = v;
  const t = studentTQuantile(1 - alpha / (2 * n), n - 2);
  const critical = ((n - 1) / Math.sqrt(n)) * Math.sqrt((t * t) / (n - 2 + t * t));
  const g = Math.abs(suspect - mean) / sd;
  return { g, critical, suspect, isOutlier: g > critical };
}
