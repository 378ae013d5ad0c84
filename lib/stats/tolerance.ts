// One-sided normal tolerance limits: the value above which a stated proportion of all drops lies,
// with a stated confidence, from a sample mean and standard deviation.
import { nonCentralTQuantile, normalQuantile } from "./distributions";
import { checkProbability, checkValues, meanAndSd } from "./sample";

function checkFactorInput(n: number, coverage: number, confidence: number): void {
  if (!Number.isInteger(n) || n < 2) throw new Error("A tolerance factor needs at least 2 values (n must be a whole number from 2)");
  checkProbability(coverage, "coverage");
  checkProbability(confidence, "confidence");
}

/**
 * Exact one-sided factor k = t′_γ(n − 1, δ = z_p·√n)/√n.
 * NIST/SEMATECH e-Handbook §7.2.6.3 (exact factor via the noncentral t); Natrella, NBS Handbook 91, Table A-7.
 */
export function toleranceFactor(n: number, coverage: number, confidence: number): number {
  checkFactorInput(n, coverage, confidence);
  const rootN = Math.sqrt(n);
  return nonCentralTQuantile(confidence, n - 1, normalQuantile(coverage) * rootN) / rootN;
}

/**
 * Closed-form approximation, k = (z_p + √(z_p² − a·b))/a with a = 1 − z_γ²/(2(n−1)), b = z_p² − z_γ²/n.
 * Natrella (NBS Handbook 91), via NIST/SEMATECH e-Handbook §7.2.6.3.
 */
export function natrellaFactor(n: number, coverage: number, confidence: number): number {
  checkFactorInput(n, coverage, confidence);
  const zp = normalQuantile(coverage);
  const zg = normalQuantile(confidence);
  const a = 1 - (zg * zg) / (2 * (n - 1));
  const b = zp * zp - (zg * zg) / n;
  // a ≤ 0 or a negative discriminant happens only for very small n, where the approximation does not apply.
  if (!(a > 0) || zp * zp - a * b < 0) throw new Error("The Natrella approximation does not apply to so few values at this confidence");
  return (zp + Math.sqrt(zp * zp - a * b)) / a;
}

/** Lower tolerance limit mean − k·s, with s the sample standard deviation and k exact. */
export function lowerToleranceLimit(values: readonly number[], coverage: number, confidence: number): { mean: number; sd: number; k: number; limit: number } {
  checkValues(values, 2, "A tolerance limit");
  const { mean, sd } = meanAndSd(values);
  const k = toleranceFactor(values.length, coverage, confidence);
  return { mean, sd, k, limit: mean - k * sd };
}
