import Papa from "papaparse";
import type { ReportData } from "./data";

// The exports: one row per drop, one row per ball. Columns are documented in DEVELOPERS.md;
// papaparse quotes per RFC 4180; times are ISO 8601 in UTC; empty cells mean "none yet".

export const DROP_COLUMNS = [
  "submission", "sample_serial", "round", "run_id", "tested_at", "drop", "state", "first_reader", "second_reader",
  "first_dispense_frame", "first_clear_frame", "second_dispense_frame", "second_clear_frame",
  "first_time_s", "second_time_s", "uncertainty_s", "agreed_time_s", "clip_sha256",
] as const;

export const BALL_COLUMNS = [
  "submission", "sample_serial", "round", "weight_g", "n", "mean_s", "sd_s", "min_s", "max_s", "range_s",
  "judged_value_s", "status", "dixon_q", "dixon_critical", "outlier_drop",
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

export function csv(columns: readonly string[], rows: (string | number)[][]): string {
  return Papa.unparse({ fields: [...columns], data: rows }, { newline: "\r\n", quotes: false, escapeFormulae: FORMULA_LIKE }) + "\r\n";
}

export function dropsCsv(r: ReportData): string {
  const rows = r.drops.map((d) => {
    const [a, b] = [d.readings.find((x) => x.slot === 1), d.readings.find((x) => x.slot === 2)];
    return [
      r.submission.reference, d.serial, d.round, d.runId, d.testedAt, d.ordinal, d.state, cell(a?.reader), cell(b?.reader),
      cell(a?.dispenseFrame), cell(a?.clearFrame), cell(b?.dispenseFrame), cell(b?.clearFrame),
      cell(a?.timeS), cell(b?.timeS), cell(d.uncertaintyS), cell(d.timeS), cell(d.clipSha256),
    ];
  });
  return csv(DROP_COLUMNS, rows);
}

export function ballsCsv(r: ReportData): string {
  const rows = r.balls.map((b) => {
    const outlier = b.drops.find((d) => d.outlier);
    return [
      r.submission.reference, b.serial, b.round, b.weightG, b.n, cell(b.mean), cell(b.sd), cell(b.min), cell(b.max), cell(b.range),
      cell(b.value), b.status, cell(b.dixon?.q), cell(b.dixon?.critical), cell(outlier?.ordinal),
    ];
  });
  return csv(BALL_COLUMNS, rows);
}
