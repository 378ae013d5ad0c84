// Repeatability of drop times on the same ball, after ISO 5725-2.
import { checkValues, meanAndSd } from "./sample";

/** ISO 5725-2 repeatability limit factor: 2.8 ≈ 1.96·√2, the 95 % range of the difference of two results. */
export const REPEATABILITY_FACTOR = 2.8;

/**
 * Pooled repeatability s_r² = Σ(n_i − 1)s_i² / Σ(n_i − 1) over groups; r = 2.8·s_r.
 * ISO 5725-2 (repeatability variance from cells) and ISO 5725-1 (repeatability limit r = 2.8·σ_r).
 */
export function pooledRepeatability(groups: readonly (readonly number[])[]): { sr: number; r: number } {
  if (!groups || groups.length === 0) throw new Error("Pooled repeatability needs at least one group of values");
  let sum = 0;
  let df = 0;
  for (const g of groups) {
    checkValues(g, 1, "Each group for pooled repeatability");
    // A group of one value has no spread to contribute but is not an error.
    if (g.length < 2) continue;
    const { sd } = meanAndSd(g);
    sum += (g.length - 1) * sd * sd;
    df += g.length - 1;
  }
  if (df === 0) throw new Error("Pooled repeatability needs at least one group with 2 or more values");
  const sr = Math.sqrt(sum / df);
  return { sr, r: REPEATABILITY_FACTOR * sr };
}
