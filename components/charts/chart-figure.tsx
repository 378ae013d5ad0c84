"use client";

/**
 * How to use: wrap every chart in `<ChartFigure title description table legend>{chart}</ChartFigure>`.
 * The figure shows the title as its caption, then the chart inside an element with role="img"
 * whose aria-label is `label` (or the title and description), then a "Show the numbers as a table"
 * disclosure holding a real <table> of `table.columns` × `table.rows` that is always in the DOM, so
 * screen readers, tests and anyone who wants the numbers read the same values the chart draws.
 * The chart child is a client component rendering recharts: spread `CHART_ROOT` from ./theme on its
 * root (responsive width, fixed height, recharts' own keyboard layer off because this figure is the
 * accessible image); take colours, dash patterns and fonts from ./theme; give every axis a label
 * with its unit through ./axis-label (`xAxisLabel("Mean of the two readings", "s")`) and round
 * ticks through ./scale (`niceScale(values)` → domain, ticks, format). A `legend` (./legend
 * `ReferenceLegend`) sits outside the image. Format the table's numbers as the page shows them
 * elsewhere; values are printed as given, and columns of numbers are right-aligned.
 */
import { useId, type ReactNode } from "react";

/** Columns of numbers (also numbers already formatted, "−1.200") line up on the right. */
const numeric = (v: string | number) => typeof v === "number" || /^[−+-]?\d[\d.,\u202f]*( \S+)?$/.test(v);

export interface ChartTable {
  caption?: string;
  columns: string[];
  rows: (string | number)[][];
}

export function ChartFigure({
  title,
  description,
  label,
  table,
  legend,
  children,
}: {
  title: string;
  description?: string;
  /** The chart's text alternative; defaults to the title and description. */
  label?: string;
  table: ChartTable;
  /** Shown under the chart, outside the image, e.g. a <ReferenceLegend> naming the lines. */
  legend?: ReactNode;
  children: ReactNode;
}) {
  const descId = useId();
  const right = table.columns.map((_, j) => table.rows.length > 0 && table.rows.every((r) => numeric(r[j])));
  const alt = label ?? (description ? `${title}. ${description}` : title);
  return (
    <figure className="space-y-3 rounded-lg border border-ink-100 bg-white p-4 shadow-sm">
      <figcaption>
        <span className="block text-lg font-semibold text-ink-900">{title}</span>
        {description && (
          <span id={descId} className="mt-1 block max-w-3xl text-sm text-ink-600">
            {description}
          </span>
        )}
      </figcaption>
      <div role="img" aria-label={alt} aria-describedby={description ? descId : undefined} data-chart="">
        {children}
      </div>
      {legend}
      <details className="text-sm">
        <summary className="cursor-pointer font-semibold text-wick-700 underline">Show the numbers as a table</summary>
        <div className="mt-2 max-h-96 overflow-auto rounded border border-ink-100">
          <table className="w-full text-left text-sm">
            <caption className="sr-only">{table.caption ?? title}</caption>
            <thead className="sticky top-0 bg-ink-50 text-ink-600">
              <tr>
                {table.columns.map((c, i) => (
                  <th key={c} scope="col" className={`px-3 py-2 font-semibold ${right[i] ? "text-right" : ""}`}>
                    {c}
                  </th>
                ))}
              </tr>
            </thead>
            <tbody>
              {table.rows.map((row, i) => (
                // biome-ignore lint/suspicious/noArrayIndexKey: a table of numbers rebuilt whole with its chart
                <tr key={i} className="border-t border-ink-100">
                  {row.map((v, j) => (
                    // biome-ignore lint/suspicious/noArrayIndexKey: cells in column order, rebuilt whole with the row
                    <td key={j} className={`px-3 py-1.5 ${right[j] ? "text-right tabular-nums" : ""}`}>
                      {String(v)}
                    </td>
                  ))}
                </tr>
              ))}
              {table.rows.length === 0 && (
                <tr>
                  <td colSpan={table.columns.length} className="px-3 py-4 text-center text-ink-600">
                    Nothing to show.
                  </td>
                </tr>
              )}
            </tbody>
          </table>
        </div>
      </details>
    </figure>
  );
}
