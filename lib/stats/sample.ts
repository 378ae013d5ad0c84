// Shared input checks and sample summaries for the statistics module.
import { mean, sampleStandardDeviation } from "simple-statistics";

/** Refuses anything but an array of finite numbers of at least `min` entries. */
export function checkValues(values: readonly number[], min: number, what: string): void {
  if (!Array.isArray(values) || values.length < min) throw new Error(`${what} needs at least ${min} values`);
  if (!values.every((v) => typeof v === "number" && Number.isFinite(v))) throw new Error(`${what} needs finite numbers only`);
}

/** Refuses a probability outside the open interval (0, 1). */
export function checkProbability(p: number, name: string): void {
  if (!(typeof p === "number" && p > 0 && p < 1)) throw new Error(`${name} must be between 0 and 1`);
}

/** Mean and sample standard deviation (n − 1 divisor). */
export function meanAndSd(values: readonly number[]): { mean: number; sd: number } {
  return { mean: mean(values as number[]), sd: sampleStandardDeviation(values as number[]) };
}
