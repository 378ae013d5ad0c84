import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { BALL_COLUMNS, ballsCsv } from "@/lib/reports/csv";
import type { ReportData } from "@/lib/reports/data";
import { frameRate } from "@/lib/reports/format";
import type { BallResult } from "@/lib/results/rules";

// The exports' text form: RFC 4180 (IETF, 2005) quoting, section 2 rules 6 and 7: a field holding a
// comma, a quote or a line break is quoted, and a quote inside it is doubled.
const ball = (over: Partial<BallResult>): BallResult => ({
  sampleId: "s1", serial: "A-1", round: 1, weightG: 6800, runId: "r1", drops: [], n: 3, mean: 140.5, sd: 1.25, min: 139, max: 142,
  range: 3, value: 140.5, status: "meets", pendingReason: null, dixon: null, ...over,
});
const data = (balls: BallResult[]) => ({ submission: { reference: "D-2026-0009" }, balls } as unknown as ReportData);

describe("balls.csv", () => {
  it("quotes a serial with a comma and a quote, and a reader of the file gets it back unchanged", () => {
    const text = ballsCsv(data([ball({ serial: 'B,"7"' })]));
    const [head, row] = text.split("\r\n");
    expect(head).toBe(BALL_COLUMNS.join(","));
    expect(row.startsWith('D-2026-0009,"B,""7""",1,6800,3,140.5,1.25,139,142,3,140.5,meets,,,')).toBe(true);
    expect(text.endsWith("\r\n")).toBe(true);
    expect(Papa.parse<Record<string, string>>(text, { header: true, skipEmptyLines: true }).data[0].sample_serial).toBe('B,"7"');
  });

  it("leaves a pending ball's statistics empty and keeps a spreadsheet from running a formula in text", () => {
    const text = ballsCsv(data([ball({ serial: "=1+1", n: 0, mean: null, sd: null, min: null, max: null, range: null, value: null, status: "pending" })]));
    expect(text.split("\r\n")[1]).toBe("D-2026-0009,\"'=1+1\",1,6800,0,,,,,,,pending,,,");
  });
});

describe("frame rates in the report", () => {
  it("reads a nominal rational rate, else the average", () => {
    expect(frameRate("30000/1001", 29.97)).toBe("29.97");
    expect(frameRate("10/1", 10)).toBe("10");
    expect(frameRate(null, 24.5)).toBe("24.5");
    expect(frameRate(null, null)).toBe("—");
  });
});
