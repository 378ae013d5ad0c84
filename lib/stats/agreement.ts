// Agreement between raters or instruments: intraclass correlation and Bland–Altman limits.
import { checkValues, meanAndSd } from "./sample";

interface Icc {
  oneWay: number;
  absolute: number;
  consistency: number;
}

/**
 * Intraclass correlations from the two-way ANOVA of a targets × raters table (rows targets, columns raters).
 * Shrout & Fleiss (1979), Psychological Bulletin 86(2), Table 1; naming after McGraw & Wong (1996):
 * oneWay = ICC(1), absolute = ICC(A,·) = ICC(2,·), consistency = ICC(C,·) = ICC(3,·).
 */
export function intraclass(ratings: readonly (readonly number[])[]): { single: Icc; average: Icc } {
  if (!ratings || ratings.length < 2) throw new Error("An intraclass correlation needs at least 2 targets (rows)");
  const k = ratings[0]?.length ?? 0;
  if (k < 2) throw new Error("An intraclass correlation needs at least 2 raters (columns)");
  for (const row of ratings) {
    if (!row || row.length !== k) throw new Error("Every target must have a rating from every rater (rows of equal length)");
    checkValues(row, k, "An intraclass correlation");
  }
  const n = ratings.length;
  const rowMeans = ratings.map((row) => row.reduce((s, v) => s + v, 0) / k);
  const grand = rowMeans.reduce((s, m) => s + m, 0) / n;
  const colMeans = Array.from({ length: k }, (_, j) => ratings.reduce((s, row) => s + row[j], 0) / n);
  let ssTotal = 0;
  for (const row of ratings) for (const v of row) ssTotal += (v - grand) ** 2;
  const ssRows = k * rowMeans.reduce((s, m) => s + (m - grand) ** 2, 0);
  const ssCols = n * colMeans.reduce((s, m) => s + (m - grand) ** 2, 0);
  const ssError = ssTotal - ssRows - ssCols;
  // Mean squares: between targets (BMS), between raters (JMS), residual (EMS), within targets (WMS).
  const bms = ssRows / (n - 1);
  const jms = ssCols / (k - 1);
  const ems = ssError / ((n - 1) * (k - 1));
  const wms = (ssCols + ssError) / (n * (k - 1));
  if (!(bms > 0)) throw new Error("An intraclass correlation needs targets that differ");
  return {
    single: {
      oneWay: (bms - wms) / (bms + (k - 1) * wms), // ICC(1,1), Shrout & Fleiss eq. 2
      absolute: (bms - ems) / (bms + (k - 1) * ems + (k * (jms - ems)) / n), // ICC(2,1), eq. 4
      consistency: (bms - ems) / (bms + (k - 1) * ems), // ICC(3,1), eq. 6
    },
    average: {
      oneWay: (bms - wms) / bms, // ICC(1,k), eq. 7
      absolute: (bms - ems) / (bms + (jms - ems) / n), // ICC(2,k), eq. 8
      consistency: (bms - ems) / bms, // ICC(3,k), eq. 9
    },
  };
}

/**
 * Limits of agreement bias ± multiplier·s of the differences a − b.
 * Bland & Altman (1986), Lancet 1(8476):307–310.
 */
export function blandAltman(a: readonly number[], b: readonly number[], multiplier = 1.96): { bias: number; sd: number; lower: number; upper: number } {
  checkValues(a, 2, "Limits of agreement");
  checkValues(b, 2, "Limits of agreement");
  if (a.length !== b.length) throw new Error("Limits of agreement need the same number of readings from both methods");
  if (!(multiplier > 0 && Number.isFinite(multiplier))) throw new Error("The multiplier must be a positive number");
  const { mean: bias, sd } = meanAndSd(a.map((v, i) => v - b[i]));
  return { bias, sd, lower: bias - multiplier * sd, upper: bias + multiplier * sd };
}
