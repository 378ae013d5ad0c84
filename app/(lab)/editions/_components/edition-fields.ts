import { BELOW_MINIMUM_RULE_LABELS, CRITERION_LABELS, type EDITION_FIELDS } from "@/lib/editions/schema";
import type { EditionJson } from "@/lib/editions/hooks";

export type EditionField = (typeof EDITION_FIELDS)[number];

export interface EditionFieldMeta {
  key: EditionField;
  label: string;
  unit?: string;
  hint?: string;
}

/** Every value a lab sets in an edition, in the order a reader checks them against the specification. */
export const EDITION_VALUES: EditionFieldMeta[] = [
  { key: "minAbsorptionS", label: "Minimum absorption time", unit: "s", hint: "A ball whose result is below this does not meet the limit." },
  { key: "criterion", label: "Criterion", hint: "Judge the ball mean against the limit, or every single drop." },
  {
    key: "belowMinimumRule",
    label: "A ball below the minimum",
    hint: "Fail the submission as soon as one ball is below the minimum, or report the ball and let the rounds and the tolerance limit decide.",
  },
  { key: "dropsPerBall", label: "Drops per ball" },
  {
    key: "guardBandS",
    label: "Guard band",
    unit: "s",
    hint: "Margin above the minimum inside which a result counts as close to the limit and asks for the next round.",
  },
  { key: "roundSizes", label: "Round sizes", hint: "Samples asked for in each round, in order, separated by commas: for example 2, 8, 24." },
  { key: "toleranceCoverage", label: "Tolerance coverage (p)", hint: "A proportion between 0 and 1, for example 0.9." },
  { key: "toleranceConfidence", label: "Tolerance confidence (γ)", hint: "A proportion between 0 and 1, for example 0.95." },
  { key: "readingToleranceS", label: "Reading agreement tolerance", unit: "s", hint: "Two readings of a drop further apart than this are a discrepancy." },
  { key: "minAcclimationH", label: "Minimum acclimation", unit: "h", hint: "Time in the test room before a run." },
  { key: "surfaceTempMinC", label: "Lowest surface temperature", unit: "°C" },
  { key: "surfaceTempMaxC", label: "Highest surface temperature", unit: "°C" },
  { key: "roughnessMaxSdUm", label: "Largest roughness spread (SD)", unit: "µm", hint: "The largest standard deviation of a run's Ra readings." },
];

export const labelWithUnit = (m: EditionFieldMeta) => (m.unit ? `${m.label} (${m.unit})` : m.label);

export function displayValue(e: EditionJson, key: EditionField): string {
  const meta = EDITION_VALUES.find((m) => m.key === key);
  const v = e[key];
  if (key === "criterion") return CRITERION_LABELS[e.criterion];
  if (key === "belowMinimumRule") return BELOW_MINIMUM_RULE_LABELS[e.belowMinimumRule];
  if (Array.isArray(v)) return v.join(", ");
  return meta?.unit ? `${v} ${meta.unit}` : String(v);
}
