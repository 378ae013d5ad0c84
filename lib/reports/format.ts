import type { EditionRow } from "../editions/queries";
import { signed } from "../numbers";
import { BELOW_MINIMUM_RULE_LABELS, CRITERION_LABELS } from "../editions/schema";

// How the report writes numbers: fixed decimals, a true minus sign, a dash for nothing.

export const fixed = (v: number | null | undefined, digits: number): string => (v === null || v === undefined ? "—" : signed(v, digits));

/** "2026-12-02 05:40" (UTC) from an ISO 8601 time, for columns headed "UTC". */
export const utcShort = (iso: string | null | undefined): string => (iso ? `${iso.slice(0, 10)} ${iso.slice(11, 16)}` : "—");

/** A frame rate for people: "30000/1001" → "29.97", "10/1" → "10". */
export function frameRate(nominal: string | null, average: number | null): string {
  const [n, d] = (nominal ?? "").split("/").map(Number);
  const v = n && d ? n / d : average;
  return v ? String(Number(v.toFixed(3))) : "—";
}

/** "2026-12-02 05:40 UTC" from an ISO 8601 time. */
export const utc = (iso: string | null | undefined): string => (iso ? `${iso.slice(0, 10)} ${iso.slice(11, 16)} UTC` : "—");

export const CAUTION =
  "The governing specification and the lab's own accredited procedure decide; the limits and defaults shown in Wickmark are examples, set per edition by the lab.";

/** The edition's values as label, value with unit, and the source the lab recorded for it. */
export function editionRows(e: EditionRow): [string, string, string][] {
  const pct = (p: number) => `${Number((p * 100).toFixed(3))} %`;
  const rows: [keyof EditionRow & string, string, string][] = [
    ["minAbsorptionS", "Minimum absorption time", `${e.minAbsorptionS} s`],
    ["criterion", "Criterion", CRITERION_LABELS[e.criterion]],
    ["belowMinimumRule", "A ball below the minimum", BELOW_MINIMUM_RULE_LABELS[e.belowMinimumRule]],
    ["dropsPerBall", "Drops per ball", String(e.dropsPerBall)],
    ["guardBandS", "Guard band above the minimum", `${e.guardBandS} s`],
    ["roundSizes", "Round sizes (samples)", e.roundSizes.join(", ")],
    ["toleranceCoverage", "Tolerance coverage", pct(e.toleranceCoverage)],
    ["toleranceConfidence", "Tolerance confidence", pct(e.toleranceConfidence)],
    ["readingToleranceS", "Reader agreement tolerance", `${e.readingToleranceS} s`],
    ["minAcclimationH", "Minimum acclimation", `${e.minAcclimationH} h`],
    ["surfaceTempMinC", "Surface temperature, lowest", `${e.surfaceTempMinC} °C`],
    ["surfaceTempMaxC", "Surface temperature, highest", `${e.surfaceTempMaxC} °C`],
    ["roughnessMaxSdUm", "Roughness spread, largest SD", `${e.roughnessMaxSdUm} µm`],
  ];
  return rows.map(([key, label, value]) => [label, value, e.sources[key] || "not recorded"]);
}
