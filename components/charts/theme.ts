// One look for every chart, taken from the Tailwind palette (tailwind.config.ts) and the app font.
// Reference lines differ by dash pattern as well as colour, so colour is never the only cue.

/** The palette's hex values, repeated here because SVG attributes cannot read Tailwind classes. */
export const PALETTE = {
  ink50: "#f2f5f9",
  ink100: "#e1e8f0",
  ink200: "#c3d0df",
  ink400: "#6a7f98",
  ink600: "#3b4f68",
  ink800: "#1d2b3d",
  ink900: "#121c29",
  wick300: "#f0bd6b",
  wick500: "#c7791b",
  wick700: "#874d0c",
  ok700: "#1f6b3d",
  bad700: "#a12727",
  white: "#ffffff",
} as const;

export const CHART_FONT = {
  family: '"Noto Sans", system-ui, sans-serif',
  tick: 12,
  label: 13,
  note: 12,
} as const;

/** Default height of a chart in px; the width follows its container. */
export const CHART_HEIGHT = 360;

export const CHART_MARGIN = { top: 16, right: 96, bottom: 40, left: 24 } as const;

/** Data series: the first is the brand amber, then ink, then green. Points get distinct shapes too. */
export const SERIES = [
  { colour: PALETTE.wick500, shape: "circle" },
  { colour: PALETTE.ink600, shape: "diamond" },
  { colour: PALETTE.ok700, shape: "triangle" },
] as const;

export type ReferenceKind = "centre" | "limit" | "minimum" | "guard";

/** Reference lines: a solid centre line, dashed limits, dash-dot minimum, dotted guard band. */
export const REFERENCE: Record<ReferenceKind, { stroke: string; strokeDasharray?: string; strokeWidth: number }> = {
  centre: { stroke: PALETTE.ink800, strokeWidth: 1.5 },
  limit: { stroke: PALETTE.wick700, strokeDasharray: "8 4", strokeWidth: 1.5 },
  minimum: { stroke: PALETTE.bad700, strokeDasharray: "12 4 2 4", strokeWidth: 2 },
  guard: { stroke: PALETTE.ink400, strokeDasharray: "2 3", strokeWidth: 1.5 },
};

/** Props for recharts' axes: ticks and lines in the ink scale, app font. */
export const AXIS = {
  stroke: PALETTE.ink400,
  tick: { fill: PALETTE.ink800, fontSize: CHART_FONT.tick, fontFamily: CHART_FONT.family },
  tickLine: { stroke: PALETTE.ink400 },
} as const;

export const GRID = { stroke: PALETTE.ink100, strokeDasharray: "3 3" } as const;

/**
 * Props every chart root takes: the figure around it is the accessible image (role="img"), so the
 * SVG itself is not made a focusable "application" by recharts' keyboard layer.
 */
export const CHART_ROOT = {
  accessibilityLayer: false,
  responsive: true,
  style: { width: "100%", height: CHART_HEIGHT, fontFamily: CHART_FONT.family },
} as const;
