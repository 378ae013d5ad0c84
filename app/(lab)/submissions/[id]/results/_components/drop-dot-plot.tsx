"use client";

import { CartesianGrid, ReferenceArea, ReferenceLine, Scatter, ScatterChart, XAxis, YAxis } from "recharts";
import type { ResultsView } from "@/lib/results/hooks";
import { referenceLabel, xAxisLabel, yAxisLabel } from "@/components/charts/axis-label";
import { ChartFigure } from "@/components/charts/chart-figure";
import { ReferenceLegend } from "@/components/charts/legend";
import { niceScale } from "@/components/charts/scale";
import { AXIS, CHART_MARGIN, CHART_ROOT, GRID, PALETTE, REFERENCE, SERIES } from "@/components/charts/theme";

interface Point {
  x: number;
  y: number;
  serial: string;
  ordinal: number;
  outlier: boolean;
}

/** Every settled drop time of every ball, with the minimum and the guard band above it. */
export function DropDotPlot({ balls, edition }: Pick<ResultsView, "balls" | "edition">) {
  const points: Point[] = balls.flatMap((b, i) =>
    b.drops
      .filter((d) => d.settled && d.timeS !== null)
      .map((d) => ({ x: i + 1, y: d.timeS as number, serial: b.serial, ordinal: d.ordinal, outlier: d.outlier })),
  );
  const L = edition.minAbsorptionS;
  const top = L + edition.guardBandS;
  const y = niceScale([...points.map((p) => p.y), L, top]);
  const serial = (x: number) => balls[x - 1]?.serial ?? "";
  return (
    <ChartFigure
      title="Drop times per ball"
      description={`Each dot is one settled drop; the dash-dot line is the ${L} s minimum and the shaded band above it the ${edition.guardBandS} s guard band. Crosses are drops Dixon's Q flags.`}
      table={{ columns: ["Ball", "Drop", "Time (s)", "Flag"], rows: points.map((p) => [p.serial, p.ordinal, p.y.toFixed(3), p.outlier ? "outlier?" : ""]) }}
      legend={
        <ReferenceLegend
          items={[
            { kind: "minimum", label: `Minimum ${L} s` },
            { kind: "guard", label: `Top of the guard band ${top} s` },
          ]}
        />
      }
    >
      <ScatterChart {...CHART_ROOT} margin={{ ...CHART_MARGIN, bottom: 56 }}>
        <CartesianGrid {...GRID} />
        <XAxis
          type="number"
          dataKey="x"
          domain={[0.5, balls.length + 0.5]}
          ticks={balls.map((_, i) => i + 1)}
          tickFormatter={serial}
          interval={0}
          angle={-40}
          textAnchor="end"
          height={64}
          {...AXIS}
          label={{ ...xAxisLabel("Ball", "serial"), offset: -48 }}
        />
        <YAxis type="number" dataKey="y" domain={y.domain} ticks={y.ticks} tickFormatter={y.format} {...AXIS} label={yAxisLabel("Drop time", "s")} width={72} />
        <ReferenceArea y1={L} y2={top} fill={PALETTE.wick300} fillOpacity={0.18} ifOverflow="extendDomain" />
        <ReferenceLine y={L} {...REFERENCE.minimum} label={referenceLabel(`min ${L} s`, REFERENCE.minimum.stroke)} />
        <ReferenceLine y={top} {...REFERENCE.guard} label={referenceLabel(`${top} s`, PALETTE.ink600)} />
        <Scatter name="Drop times" data={points.filter((p) => !p.outlier)} fill={SERIES[0].colour} shape="circle" isAnimationActive={false} />
        <Scatter name="Flagged drops" data={points.filter((p) => p.outlier)} fill={PALETTE.bad700} shape="cross" isAnimationActive={false} />
      </ScatterChart>
    </ChartFigure>
  );
}
