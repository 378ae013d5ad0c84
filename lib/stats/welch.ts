// Difference of two means without assuming equal variances.
import { studentTQuantile } from "./distributions";
import { checkProbability, checkValues, meanAndSd } from "./sample";

export interface SampleSummary {
  n: number;
  mean: number;
  sd: number;
}

export function summarize(values: readonly number[]): SampleSummary {
  checkValues(values, 1, "A sample summary");
  if (values.length === 1) return { n: 1, mean: values[0], sd: Number.NaN };
  return { n: values.length, ...meanAndSd(values) };
}

/**
 * Welch's interval for mean(a) − mean(b): se = √(s_a²/n_a + s_b²/n_b), Welch–Satterthwaite
 * df = se⁴ / Σ (s²/n)²/(n − 1), half-width t_{(1+c)/2, df}·se. Welch (1947), Biometrika 34.
 */
export function welchInterval(
  a: SampleSummary,
  b: SampleSummary,
  confidence: number,
): { difference: number; se: number; df: number; t: number; lower: number; upper: number } {
  checkProbability(confidence, "confidence");
  for (const s of [a, b]) {
    if (!(Number.isInteger(s.n) && s.n >= 2)) throw new Error("A Welch interval needs at least 2 values in each sample");
    if (!(Number.isFinite(s.mean) && Number.isFinite(s.sd) && s.sd >= 0)) throw new Error("A Welch interval needs finite means and standard deviations");
  }
  const va = (a.sd * a.sd) / a.n;
  const vb = (b.sd * b.sd) / b.n;
  const se = Math.sqrt(va + vb);
  if (!(se > 0)) throw new Error("A Welch interval needs values that are not all equal in both samples");
  const df = se ** 4 / ((va * va) / (a.n - 1) + (vb * vb) / (b.n - 1));
  const difference = a.mean - b.mean;
  const t = studentTQuantile((1 + confidence) / 2, df);
  return { difference, se, df, t, lower: difference - t * se, upper: difference + t * se };
}
