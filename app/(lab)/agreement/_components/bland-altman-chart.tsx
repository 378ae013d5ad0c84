"use client";

import { CartesianGrid, ReferenceLine, Scatter, ScatterChart, XAxis, YAxis } from "recharts";
import { referenceLabel, xAxisLabel, yAxisLabel } from "@/components/charts/axis-label";
import { ChartFigure } from "@/components/charts/chart-figure";
import { ReferenceLegend } from "@/components/charts/legend";
import { niceScale } from "@/components/charts/scale";
import { AXIS, CHART_MARGIN, CHART_ROOT, GRID, REFERENCE, SERIES } from "@/components/charts/theme";
import type { AgreementReport } from "@/lib/agreement/hooks";
import { signedMs, tableMs } from "./numbers";

/** Bland–Altman plot: each drop's first − second against the mean of its two readings. */
export function BlandAltmanChart({ report }: { report: AgreementReport }) {
  const s = report.statistics;
  const points = report.points;
  const x = niceScale(points.map((p) => p.meanS));
  const y = niceScale([...points.map((p) => p.differenceS), ...(s ? [s.lowerS, s.upperS] : []), 0]);
  const lines = s
    ? [
        { kind: "limit" as const, value: s.upperS, text: `Upper limit ${signedMs(s.upperS)}` },
        { kind: "centre" as const, value: s.biasS, text: `Bias ${signedMs(s.biasS)}` },
        { kind: "limit" as const, value: s.lowerS, text: `Lower limit ${signedMs(s.lowerS)}` },
      ]
    : [];
  return (
    <ChartFigure
      title="Differences between the two readings"
      description={`${points.length} ${points.length === 1 ? "drop" : "drops"}: each point is one drop, at the mean of its two readings (across) and the first reading minus the second (up).${s ? ` The solid line is the bias, the dashed lines the limits of agreement (bias ± ${s.multiplier} sd).` : ""}`}
      table={{
        caption: "Each drop's mean of the two readings and first − second, in seconds",
        columns: ["Drop", "Mean of the two readings (s)", "First − second (s)"],
        rows: points.map((p) => [`${p.submissionReference} · ${p.sampleSerial} · drop ${p.ordinal}`, tableMs(p.meanS), tableMs(p.differenceS)]),
      }}
      legend={
        s && (
          <ReferenceLegend
            items={[
              { kind: "centre", label: `Bias ${signedMs(s.biasS)}` },
              { kind: "limit", label: `Limits of agreement ${signedMs(s.lowerS)} to ${signedMs(s.upperS)}` },
            ]}
          />
        )
      }
    >
      <ScatterChart {...CHART_ROOT} margin={{ ...CHART_MARGIN, right: 150, left: 32 }}>
        <CartesianGrid {...GRID} />
        <XAxis
          type="number"
          dataKey="meanS"
          domain={x.domain}
          ticks={x.ticks}
          tickFormatter={x.format}
          {...AXIS}
          label={xAxisLabel("Mean of the two readings", "s")}
        />
        <YAxis
          type="number"
          dataKey="differenceS"
          domain={y.domain}
          ticks={y.ticks}
          tickFormatter={y.format}
          {...AXIS}
          width={64}
          label={yAxisLabel("First − second", "s")}
        />
        {lines.map((l) => (
          <ReferenceLine key={l.text} y={l.value} {...REFERENCE[l.kind]} label={referenceLabel(l.text, REFERENCE[l.kind].stroke)} />
        ))}
        <Scatter data={points} fill={SERIES[0].colour} stroke={SERIES[0].colour} shape={SERIES[0].shape} isAnimationActive={false} />
      </ScatterChart>
    </ChartFigure>
  );
}
