import { CHART_FONT, PALETTE } from "./theme";

/** "Mean of the two readings" + "s" → "Mean of the two readings (s)": every axis names its unit. */
export function withUnit(quantity: string, unit: string): string {
  return `${quantity} (${unit})`;
}

const TEXT = { fill: PALETTE.ink800, fontSize: CHART_FONT.label, fontFamily: CHART_FONT.family, fontWeight: 600 };

/** A recharts `label` prop for an x axis: centred under the ticks. */
export function xAxisLabel(quantity: string, unit: string) {
  return { value: withUnit(quantity, unit), position: "insideBottom" as const, offset: -24, style: TEXT };
}

/** A recharts `label` prop for a y axis: turned to read upwards, beside the ticks. */
export function yAxisLabel(quantity: string, unit: string) {
  return { value: withUnit(quantity, unit), angle: -90, position: "insideLeft" as const, offset: 4, style: { ...TEXT, textAnchor: "middle" as const } };
}

/** A recharts `label` prop for a horizontal reference line: its name and value right of the plot. */
export function referenceLabel(text: string, colour: string) {
  return { value: text, position: "right" as const, style: { fill: colour, fontSize: CHART_FONT.note, fontFamily: CHART_FONT.family } };
}
