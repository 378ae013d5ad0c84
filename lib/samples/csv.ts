import Papa from "papaparse";
import { toGrams, type MassUnit } from "../units/rules";

// Bulk sample entry: a pasted or uploaded CSV of serials and weights. Pure: every bad row is
// reported with its line number and reason, and nothing is returned as valid unless all rows are.

export interface CsvSampleRow {
  line: number;
  serial: string;
  weightG: number;
  receivedAt: Date | null;
  acclimationStartedAt: Date | null;
  notes: string;
}

export interface CsvRowError {
  line: number;
  reason: string;
}

export type CsvResult = { ok: true; rows: CsvSampleRow[] } | { ok: false; errors: CsvRowError[] };

const UNITS: Record<string, MassUnit> = { g: "g", gram: "g", grams: "g", oz: "oz", ounce: "oz", ounces: "oz", lb: "lb", lbs: "lb", pound: "lb", pounds: "lb" };
const COLUMNS = ["serial", "weight", "unit", "received_at", "acclimation_started_at", "notes"] as const;
type Column = (typeof COLUMNS)[number];
export const MAX_CSV_ROWS = 500;

export function parseSampleCsv(text: string, defaultUnit: MassUnit): CsvResult {
  const parsed = Papa.parse<string[]>(text.replace(/^\uFEFF/, ""), { skipEmptyLines: "greedy" });
  const errors: CsvRowError[] = parsed.errors.map((e) => ({ line: (e.row ?? 0) + 1, reason: `The CSV is malformed here: ${e.message}.` }));
  const data = parsed.data;
  if (data.length === 0) return { ok: false, errors: [{ line: 1, reason: "The CSV is empty: give one row per sample with its serial and weight." }] };

  const first = data[0].map((c) => c.trim().toLowerCase().replace(/\s+/g, "_"));
  const hasHeader = first.includes("serial");
  const order: (Column | null)[] = hasHeader ? first.map((h) => ((COLUMNS as readonly string[]).includes(h) ? (h as Column) : null)) : [...COLUMNS];
  if (hasHeader && !order.includes("weight")) errors.push({ line: 1, reason: "The header has no weight column." });
  const body = hasHeader ? data.slice(1) : data;
  if (body.length > MAX_CSV_ROWS) errors.push({ line: MAX_CSV_ROWS + 1, reason: `At most ${MAX_CSV_ROWS} samples in one file.` });

  const rows: CsvSampleRow[] = [];
  const seen = new Map<string, number>();
  body.slice(0, MAX_CSV_ROWS).forEach((cells, i) => {
    const line = i + 1 + (hasHeader ? 1 : 0);
    const get = (c: Column) => (cells[order.indexOf(c)] ?? "").trim();
    const fail = (reason: string) => errors.push({ line, reason });
    const serial = get("serial");
    if (!serial) return fail("The serial number is missing.");
    if (serial.length > 60) return fail("The serial number is longer than 60 characters.");
    if (seen.has(serial.toLowerCase())) return fail(`Serial ${serial} appears twice (also on line ${seen.get(serial.toLowerCase())}).`);
    seen.set(serial.toLowerCase(), line);
    const rawWeight = get("weight").replace(",", ".");
    const value = Number(rawWeight);
    if (!rawWeight || !Number.isFinite(value)) return fail(`The weight "${get("weight")}" is not a number.`);
    const unitText = get("unit").toLowerCase();
    const unit = unitText ? UNITS[unitText] : defaultUnit;
    if (!unit) return fail(`The unit "${get("unit")}" is not one of g, oz or lb.`);
    const weightG = toGrams(value, unit);
    if (weightG <= 0 || weightG > 10_000) return fail(`The weight ${value} ${unit} is not a plausible ball weight.`);
    const receivedAt = optionalDate(get("received_at"));
    if (receivedAt === "bad") return fail(`The received date "${get("received_at")}" is not an ISO 8601 date or time.`);
    const acclimationStartedAt = optionalDate(get("acclimation_started_at"));
    if (acclimationStartedAt === "bad") return fail(`The acclimation start "${get("acclimation_started_at")}" is not an ISO 8601 date or time.`);
    rows.push({ line, serial, weightG, receivedAt, acclimationStartedAt, notes: get("notes").slice(0, 500) });
  });
  return errors.length ? { ok: false, errors: errors.sort((a, b) => a.line - b.line) } : { ok: true, rows };
}

function optionalDate(s: string): Date | null | "bad" {
  if (!s) return null;
  if (!/^\d{4}-\d{2}-\d{2}([T ]\d{2}:\d{2}(:\d{2}(\.\d+)?)?(Z|[+-]\d{2}:?\d{2})?)?$/.test(s)) return "bad";
  // Times without a zone are read as UTC, whatever the server's own zone.
  const iso = s.replace(" ", "T");
  const d = new Date(s.length === 10 ? `${s}T00:00:00Z` : /(Z|[+-]\d{2}:?\d{2})$/.test(iso) ? iso : `${iso}Z`);
  return Number.isNaN(d.getTime()) ? "bad" : d;
}
