import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { BALL_COLUMNS, ballsCsv, csv, dropsCsv, FORMULA_LIKE, timeDecimals } from "@/lib/reports/csv";
import type { ReportData } from "@/lib/reports/data";
import { frameRate } from "@/lib/reports/format";
import { changeLines } from "@/lib/signoff/report-part";
import type { BallResult } from "@/lib/results/rules";

// The exports' text form: RFC 4180 (IETF, 2005) quoting, section 2 rules 6 and 7: a field holding a
// comma, a quote or a line break is quoted, and a quote inside it is doubled.
const ball = (over: Partial<BallResult>): BallResult => ({
  sampleId: "s1",
  serial: "A-1",
  round: 1,
  weightG: 6800,
  runId: "r1",
  drops: [],
  n: 3,
  mean: 140.5,
  sd: 1.25,
  min: 139,
  max: 142,
  range: 3,
  value: 140.5,
  status: "meets",
  pendingReason: null,
  dixon: null,
  ...over,
});
const EDITION = { criterion: "ball_mean", minAbsorptionS: 135, guardBandS: 10 };
const data = (balls: BallResult[], edition: object = EDITION) => ({ submission: { reference: "D-2026-0009" }, edition, balls }) as unknown as ReportData;

// Sums of decimals in binary carry noise: 140.33 + 0.33 is 140.66000000000003 in double precision.
const NOISY_MEAN = 140.33 + 0.33;

describe("numbers at the precision their measurement supports", () => {
  it("writes statistics to the millisecond, without float noise, and still as numbers", () => {
    const row = ballsCsv(data([ball({ mean: NOISY_MEAN, sd: 1.2345678, min: 139.0000000001, max: 142.1, range: 142.1 - 139, value: NOISY_MEAN })])).split(
      "\r\n",
    )[1];
    expect(row).toBe("D-2026-0009,A-1,1,6800,3,140.66,1.235,139,142.1,3.1,140.66,meets,,,");
  });

  it("keeps a judged value on its side of the minimum: 134.9996 is not written as 135", () => {
    const row = ballsCsv(data([ball({ mean: 134.9996, value: 134.9996, status: "below" })])).split("\r\n")[1];
    expect(row).toContain(",134.9996,");
    expect(row).not.toContain(",135,");
    // Judged on every drop, the shortest drop is the judged one.
    const every = ballsCsv(data([ball({ mean: 140, min: 144.99995, value: 144.99995, status: "close" })], { ...EDITION, criterion: "every_drop" })).split(
      "\r\n",
    )[1];
    expect(every).toBe("D-2026-0009,A-1,1,6800,3,140,1.25,144.99995,142,3,144.99995,close,,,");
  });

  it("writes drop times to half a tick of the recording's time base", () => {
    expect(timeDecimals({ num: 1, den: 90000 })).toBe(6);
    expect(timeDecimals({ num: 1, den: 25 })).toBe(2);
    expect(timeDecimals({ num: 1001, den: 30000 })).toBe(2);
    const drop = {
      id: "d1",
      runId: "r1",
      serial: "A-1",
      round: 1,
      ordinal: 1,
      state: "agreed",
      testedAt: "2026-12-01T10:00:00.000Z",
      clipSha256: "ab",
      timeBase: { num: 1, den: 90000 },
      readings: [
        { slot: 1, reader: "A", dispenseFrame: 3, clearFrame: 99, timeS: 4.56 + 0.1 },
        { slot: 2, reader: "B", dispenseFrame: 3, clearFrame: 100, timeS: 4.6933333333333 },
      ],
      timeS: 4.676666666666665,
      uncertaintyS: 0.0272165527,
      outlier: false,
    };
    const row = dropsCsv({ ...data([]), drops: [drop] } as unknown as ReportData).split("\r\n")[1];
    expect(row).toBe("D-2026-0009,A-1,1,r1,2026-12-01T10:00:00.000Z,1,agreed,A,B,3,99,3,100,4.66,4.693333,0.0272,4.676667,ab");
  });
});

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
    expect(text.split("\r\n")[1]).toBe('D-2026-0009,"\'=1+1",1,6800,0,,,,,,,pending,,,');
  });
});

// Formula injection: OWASP's "CSV Injection" page (from memory) names =, +, -, @, tab and carriage
// return as the characters that make a spreadsheet read a cell as a formula; prefixing ' keeps it text.
describe("cells a spreadsheet could run as a formula", () => {
  const line = (row: (string | number)[]) => csv(["a", "b", "c"], [row]).split("\r\n")[1];

  it("writes negative numbers as numbers, unquoted and unprefixed", () => {
    expect(line([-0.5, -12, -1.25e-7])).toBe("-0.5,-12,-1.25e-7");
    expect(ballsCsv(data([ball({ mean: -0.25, sd: 0 })])).split("\r\n")[1]).toContain(",3,-0.25,0,");
  });

  it("leaves text that is a plain number alone", () => {
    expect(line(["-0.5", "+3", "-.5"])).toBe("-0.5,+3,-.5");
    expect(["-1e3", "12", "-7."].every((t) => !FORMULA_LIKE.test(t))).toBe(true);
  });

  it("prefixes formula-like text, also when a line break follows the formula", () => {
    expect(line(["-1+2", "@SUM(A1:A9)", "+44 20 7946 0000"])).toBe(`"'-1+2","'@SUM(A1:A9)","'+44 20 7946 0000"`);
    expect(line(['=HYPERLINK("http://x.test")\nmore', "\tx", "\rx"])).toBe(`"'=HYPERLINK(""http://x.test"")\nmore","'\tx","'\rx"`);
    const back = Papa.parse<string[]>(csv(["a"], [["=1+1\nx"]])).data[1];
    expect(back).toEqual(["'=1+1\nx"]);
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

describe("what changed since the previous revision, in the report", () => {
  it("writes the stored difference of two signed results as sentences", () => {
    expect(
      changeLines({
        balls: [{ serial: "A-1", mean: { before: 2.84, after: 2.9 }, status: { before: "close", after: "meets" } }],
        ballsAdded: ["A-3"],
        ballsRemoved: [],
        decision: { before: "next round", after: "meets limit" },
      }),
    ).toEqual(["Decision: from next round to meets limit.", "A-1: mean from 2.840 s to 2.900 s; status from close to meets.", "Balls added: A-3."]);
    expect(changeLines({ balls: [], ballsAdded: [], ballsRemoved: [], decision: null })).toEqual(["No ball result and no decision changed."]);
  });
});
