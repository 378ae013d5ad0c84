"use client";

import { CartesianGrid, ComposedChart, Line, ReferenceArea, ReferenceLine, Scatter, XAxis, YAxis } from "recharts";
import type { ResultsView } from "@/lib/results/hooks";
import { xAxisLabel, yAxisLabel } from "@/components/charts/axis-label";
import { ChartFigure } from "@/components/charts/chart-figure";
import { ReferenceLegend } from "@/components/charts/legend";
import { niceScale } from "@/components/charts/scale";
import { AXIS, CHART_MARGIN, CHART_ROOT, GRID, PALETTE, REFERENCE, SERIES } from "@/components/charts/theme";
import { stackDots } from "./stack-dots";

const density = (x: number, m: number, s: number) => Math.exp(-0.5 * ((x - m) / s) ** 2) / (s * Math.sqrt(2 * Math.PI));

/**
 * The balls' judged values as stacked dots (one per ball, in bins), the normal distribution fitted
 * to them (scaled to balls per bin), the minimum, the guard band and the lower tolerance limit.
 */
export function MeansDistribution({ balls, edition, decision }: Pick<ResultsView, "balls" | "edition" | "decision">) {
  const values = balls.filter((b) => b.value !== null).map((b) => ({ serial: b.serial, value: b.value as number }));
  const t = decision.tolerance;
  const L = edition.minAbsorptionS;
  const top = L + edition.guardBandS;
  const { dots, bin } = stackDots(values);
  const edges = [...values.map((v) => v.value), L, top, ...(t ? [t.limit, t.mean - 3 * t.sd, t.mean + 3 * t.sd] : [])];
  const x = niceScale(edges);
  const domain = x.domain;
  const curve =
    t && t.sd > 0
      ? Array.from({ length: 81 }, (_, i) => {
          const x = domain[0] + ((domain[1] - domain[0]) * i) / 80;
          return { x, fit: values.length * bin * density(x, t.mean, t.sd) };
        })
      : [];
  // Whole balls on the y axis, with room above the highest stack and the fitted curve's peak.
  const yTop = Math.max(2, Math.ceil(Math.max(0, ...dots.map((d) => d.y + 0.5), ...curve.map((c) => c.fit)) + 1));
  const what = edition.criterion === "every_drop" ? "shortest drop" : "mean";
  return (
    <ChartFigure
      title={`Distribution of ball ${what}s`}
      description={`One dot per ball (bins of ${bin} s), the normal distribution fitted to them, the ${L} s minimum with its guard band${t ? `, and the lower tolerance limit ${t.limit.toFixed(2)} s` : ""}.`}
      table={{ columns: ["Ball", `Ball ${what} (s)`], rows: values.map((v) => [v.serial, v.value.toFixed(2)]) }}
      legend={
        <ReferenceLegend
          items={[
            { kind: "minimum", label: `Minimum ${L} s` },
            { kind: "guard", label: `Top of the guard band ${top} s` },
            ...(t
              ? [
                  { kind: "limit" as const, label: `Lower tolerance limit ${t.limit.toFixed(2)} s` },
                  { kind: "centre" as const, label: "Normal fit" },
                ]
              : []),
          ]}
        />
      }
    >
      <ComposedChart {...CHART_ROOT} margin={CHART_MARGIN}>
        <CartesianGrid {...GRID} />
        <XAxis
          type="number"
          dataKey="x"
          domain={domain}
          ticks={x.ticks}
          tickFormatter={x.format}
          allowDataOverflow
          {...AXIS}
          label={xAxisLabel(`Ball ${what}`, "s")}
        />
        <YAxis
          type="number"
          allowDecimals={false}
          domain={[0, yTop]}
          ticks={Array.from({ length: yTop + 1 }, (_, i) => i)}
          {...AXIS}
          label={yAxisLabel(`Balls per ${bin} s`, "count")}
          width={72}
        />
        <ReferenceArea x1={L} x2={top} fill={PALETTE.wick300} fillOpacity={0.18} />
        <ReferenceLine x={L} {...REFERENCE.minimum} />
        <ReferenceLine x={top} {...REFERENCE.guard} />
        {t && <ReferenceLine x={t.limit} {...REFERENCE.limit} />}
        {curve.length > 0 && (
          <Line data={curve} dataKey="fit" type="monotone" dot={false} stroke={REFERENCE.centre.stroke} strokeWidth={2} isAnimationActive={false} />
        )}
        <Scatter data={dots} dataKey="y" fill={SERIES[0].colour} shape="circle" isAnimationActive={false} />
      </ComposedChart>
    </ChartFigure>
  );
}
