import { describe, expect, it } from "vitest";
import { parseSampleCsv } from "@/lib/samples/csv";

describe("parseSampleCsv", () => {
  it("reads a file with a header, in any column order, with per-row units", () => {
    const r = parseSampleCsv("weight,serial,unit,notes\n16,AB-1,lb,first\n7241.9,AB-2,g,\n", "oz");
    expect(r).toEqual({
      ok: true,
      rows: [
        { line: 2, serial: "AB-1", weightG: 7257.48, receivedAt: null, acclimationStartedAt: null, notes: "first" },
        { line: 3, serial: "AB-2", weightG: 7241.9, receivedAt: null, acclimationStartedAt: null, notes: "" },
      ],
    });
  });

  it("reads a file without a header as serial, weight in the chosen unit", () => {
    const r = parseSampleCsv("X1,256\r\nX2,255.5\r\n", "oz");
    expect(r.ok && r.rows.map((x) => [x.line, x.serial, x.weightG])).toEqual([
      [1, "X1", 7257.48],
      [2, "X2", 7243.3],
    ]);
  });

  it("reads dates, quoted fields and a byte-order mark", () => {
    const r = parseSampleCsv('\uFEFFserial,weight,received_at,acclimation_started_at,notes\n"Q,1",7000,2026-11-30,2026-11-30 08:15,"a ""quoted"" note"\n', "g");
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.rows[0]).toMatchObject({ serial: "Q,1", notes: 'a "quoted" note' });
    expect(r.rows[0].receivedAt?.toISOString()).toBe("2026-11-30T00:00:00.000Z");
    expect(r.rows[0].acclimationStartedAt?.toISOString()).toBe("2026-11-30T08:15:00.000Z");
  });

  it("reports every bad row with its line number and reason", () => {
    const csv = ["serial,weight,unit,received_at", ",7000,g,", "B,heavy,g,", "C,7000,stone,", "D,0,g,", "E,7000,g,yesterday", "F,7000,g,", "f,7001,g,"].join(
      "\n",
    );
    const r = parseSampleCsv(csv, "g");
    expect(r).toEqual({
      ok: false,
      errors: [
        { line: 2, reason: "The serial number is missing." },
        { line: 3, reason: 'The weight "heavy" is not a number.' },
        { line: 4, reason: 'The unit "stone" is not one of g, oz or lb.' },
        { line: 5, reason: "The weight 0 g is not a plausible ball weight." },
        { line: 6, reason: 'The received date "yesterday" is not an ISO 8601 date or time.' },
        { line: 8, reason: "Serial f appears twice (also on line 7)." },
      ],
    });
  });

  it("refuses an empty file and a header without weights", () => {
    expect(parseSampleCsv("\n\n", "g")).toEqual({
      ok: false,
      errors: [{ line: 1, reason: "The CSV is empty: give one row per sample with its serial and weight." }],
    });
    const r = parseSampleCsv("serial,mass\nA,1\n", "g");
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.errors[0]).toEqual({ line: 1, reason: "The header has no weight column." });
  });
});
