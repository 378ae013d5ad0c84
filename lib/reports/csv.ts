import Papa from "papaparse";
import { digitsAgainst } from "../numbers";
import { judgedThresholds } from "../results/words";
import type { ReportData } from "./data";

// The exports: one row per drop, one row per ball. Columns are documented in DEVELOPERS.md;
// papaparse quotes per RFC 4180; times are ISO 8601 in UTC; empty cells mean "none yet".

export const DROP_COLUMNS = [
  "submission",
  "sample_serial",
  "round",
  "run_id",
  "tested_at",
  "drop",
  "state",
  "first_reader",
  "second_reader",
  "first_dispense_frame",
  "first_clear_frame",
  "second_dispense_frame",
  "second_clear_frame",
  "first_time_s",
  "second_time_s",
  "uncertainty_s",
  "agreed_time_s",
  "clip_sha256",
] as const;

export const BALL_COLUMNS = [
  "submission",
  "sample_serial",
  "round",
  "weight_g",
  "n",
  "mean_s",
  "sd_s",
  "min_s",
  "max_s",
  "range_s",
  "judged_value_s",
  "status",
  "dixon_q",
  "dixon_critical",
  "outlier_drop",
] as const;

/**
 * Text a spreadsheet would run as a formula: it starts with =, +, -, @, a tab or a carriage return
 * (common practice: the OWASP "CSV Injection" guidance, from memory). papaparse prefixes such a
 * cell with ' and quotes it. Numbers are written as numbers and never prefixed, and neither is text
 * that is a plain number ("-0.5"); unlike papaparse's own pattern, this one also catches a formula
 * followed by a line break.
 */
export const FORMULA_LIKE = /^(?![+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$)[=+\-@\t\r]/;

const cell = (v: number | string | null | undefined) => (v === null || v === undefined ? "" : v);

// Each number at the precision its measurement supports, so no float noise reaches a spreadsheet
// (4.659999999999997 is written 4.66): still numbers, without trailing zeros.
/** Decimals of statistics of drop times (mean, SD, extremes, range, judged value): milliseconds. */
export const STAT_DECIMALS = 3;
/** Decimals of the expanded uncertainty: a tenth of a millisecond. */
export const UNCERTAINTY_DECIMALS = 4;
/** Decimals of Dixon's Q and its critical value, as the critical values are tabulated. */
export const DIXON_DECIMALS = 3;

/** Decimals that resolve half a tick of a time base, so a mean of two readings is kept too: 1/90000 s → 6. */
export function timeDecimals(tb: { num: number; den: number } | null): number {
  return tb ? Math.max(0, Math.ceil(Math.log10((2 * tb.den) / tb.num))) : 6;
}

const at = (v: number | null | undefined, digits: number) => (v === null || v === undefined ? "" : Number(v.toFixed(digits)));

export function csv(columns: readonly string[], rows: (string | number)[][]): string {
  return `${Papa.unparse({ fields: [...columns], data: rows }, { newline: "\r\n", quotes: false, escapeFormulae: FORMULA_LIKE })}\r\n`;
}

export function dropsCsv(r: ReportData): string {
  const rows = r.drops.map((d) => {
    const t = timeDecimals(d.timeBase);
    const [a, b] = [d.readings.find((x) => x.slot === 1), d.readings.find((x) => x.slot === 2)];
    return [
      r.submission.reference,
      d.serial,
      d.round,
      d.runId,
      d.testedAt,
      d.ordinal,
      d.state,
      cell(a?.reader),
      cell(b?.reader),
      cell(a?.dispenseFrame),
      cell(a?.clearFrame),
      cell(b?.dispenseFrame),
      cell(b?.clearFrame),
      at(a?.timeS, t),
      at(b?.timeS, t),
      at(d.uncertaintyS, UNCERTAINTY_DECIMALS),
      at(d.timeS, t),
      cell(d.clipSha256),
    ];
  });
  return csv(DROP_COLUMNS, rows);
}

export function ballsCsv(r: ReportData): string {
  // A judged value keeps the decimals that hold it on its side of the minimum and the guard band's top.
  const every = r.edition.criterion === "every_drop";
  const lines = judgedThresholds(r.edition);
  const judgedAt = (judged: number | null, v: number | null) =>
    v === null ? "" : judged === null ? at(v, STAT_DECIMALS) : Number(v.toFixed(digitsAgainst(v, lines, STAT_DECIMALS)));
  const rows = r.balls.map((b) => {
    const outlier = b.drops.find((d) => d.outlier);
    return [
      r.submission.reference,
      b.serial,
      b.round,
      b.weightG,
      b.n,
      judgedAt(every ? null : b.mean, b.mean),
      at(b.sd, STAT_DECIMALS),
      judgedAt(every ? b.min : null, b.min),
      at(b.max, STAT_DECIMALS),
      at(b.range, STAT_DECIMALS),
      judgedAt(b.value, b.value),
      b.status,
      at(b.dixon?.q, DIXON_DECIMALS),
      at(b.dixon?.critical, DIXON_DECIMALS),
      cell(outlier?.ordinal),
    ];
  });
  return csv(BALL_COLUMNS, rows);
}
