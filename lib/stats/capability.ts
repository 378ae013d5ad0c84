// Capability against a lower limit only: how far the mean sits above the limit in units of 3s.
import { normalCdf, normalQuantile } from "./distributions";
import { checkProbability, checkValues, meanAndSd } from "./sample";

/**
 * Cpl = (mean − L)/(3s) (= Cpk with a lower limit only); estimated fraction below p̂ = Φ((L − mean)/s).
 * Standard capability ratio for a lower limit only; the fraction assumes normal drop times (standard; from memory).
 */
export function fractionBelow(values: readonly number[], limit: number): { mean: number; sd: number; cpl: number; fraction: number } {
  checkValues(values, 2, "A fraction below a limit");
  if (!Number.isFinite(limit)) throw new Error("The limit must be a finite number");
  const { mean, sd } = meanAndSd(values);
  if (!(sd > 0)) throw new Error("A fraction below a limit needs values that are not all equal");
  return { mean, sd, cpl: (mean - limit) / (3 * sd), fraction: normalCdf((limit - mean) / sd) };
}

/**
 * Approximate confidence interval Cpk ± z_{(1+c)/2}·√(1/(9n) + Cpk²/(2(n−1))).
 * Bissell (1990), "How reliable is your capability index?", Applied Statistics 39 (citation from memory).
 */
export function cpkInterval(cpk: number, n: number, confidence: number): [number, number] {
  if (!Number.isFinite(cpk)) throw new Error("Cpk must be a finite number");
  if (!Number.isInteger(n) || n < 2) throw new Error("A Cpk interval needs at least 2 values (n must be a whole number from 2)");
  checkProbability(confidence, "confidence");
  const half = normalQuantile((1 + confidence) / 2) * Math.sqrt(1 / (9 * n) + (cpk * cpk) / (2 * (n - 1)));
  return [cpk - half, cpk + half];
}
