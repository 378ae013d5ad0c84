import { describe, expect, it } from "vitest";
import { largestDisagreements, reviewerBias, summariseAgreement, type ReadingPair } from "@/lib/agreement/rules";

// Source: Bland & Altman (1986), Lancet 1(8476):307–310, peak expiratory flow, first reading on each meter.
// Read here as if the Wright meter were the first reading of 17 drops and the Mini meter the second.
const WRIGHT = [494, 395, 516, 434, 476, 557, 413, 442, 650, 433, 417, 656, 267, 478, 178, 423, 427];
const MINI = [512, 430, 520, 428, 500, 600, 364, 380, 658, 445, 432, 626, 260, 477, 259, 350, 451];

const ANN = { reviewerId: "r-ann", reviewerName: "Ann Tester" };
const BEN = { reviewerId: "r-ben", reviewerName: "Ben Tester" };
const CAL = { reviewerId: "r-cal", reviewerName: "Cal Tester" };

function pair(i: number, first: number, second: number, over: Partial<ReadingPair> = {}): ReadingPair {
  return {
    dropId: `drop-${String(i).padStart(2, "0")}`,
    submissionReference: "S-1",
    sampleSerial: "B1",
    ordinal: (i % 3) + 1,
    first: { ...ANN, timeS: first },
    second: { ...BEN, timeS: second },
    agreedS: null,
    settledAt: `2026-03-${String((i % 28) + 1).padStart(2, "0")}T10:00:00.000Z`,
    ...over,
  };
}

const LANCET = WRIGHT.map((w, i) => pair(i, w, MINI[i]));

/** ICC(1,1) by the one-way ANOVA mean squares, written out for two readings a drop: Shrout & Fleiss (1979), case 1. */
function icc11ByAnova(rows: [number, number][]): number {
  const n = rows.length;
  const k = 2;
  const grand = rows.reduce((s, [a, b]) => s + a + b, 0) / (n * k);
  let ssb = 0;
  let ssw = 0;
  for (const [a, b] of rows) {
    const m = (a + b) / 2;
    ssb += k * (m - grand) ** 2;
    ssw += (a - m) ** 2 + (b - m) ** 2;
  }
  const bms = ssb / (n - 1);
  const wms = ssw / (n * (k - 1));
  return (bms - wms) / (bms + (k - 1) * wms);
}

/** ICC(A,1) by the two-way ANOVA mean squares, written out for two columns: McGraw & Wong (1996), case A. */
function iccA1ByAnova(rows: [number, number][]): number {
  const n = rows.length;
  const k = 2;
  const grand = rows.reduce((s, [a, b]) => s + a + b, 0) / (n * k);
  const colA = rows.reduce((s, [a]) => s + a, 0) / n;
  const colB = rows.reduce((s, [, b]) => s + b, 0) / n;
  let ssr = 0;
  let sse = 0;
  for (const [a, b] of rows) {
    const m = (a + b) / 2;
    ssr += k * (m - grand) ** 2;
    sse += (a - m - colA + grand) ** 2 + (b - m - colB + grand) ** 2;
  }
  const ssc = n * ((colA - grand) ** 2 + (colB - grand) ** 2);
  const msr = ssr / (n - 1);
  const msc = ssc / (k - 1);
  const mse = sse / ((n - 1) * (k - 1));
  return (msr - mse) / (msr + (k - 1) * mse + (k / n) * (msc - mse));
}

describe("summariseAgreement", () => {
  it("gives the Bland & Altman (1986) bias, sd and 1.96 s limits for first − second", () => {
    const s = summariseAgreement(LANCET);
    expect(s.n).toBe(17);
    expect(s.reason).toBeNull();
    // Source: Bland & Altman (1986), Lancet 1(8476):307–310 (check-values §5): mean −2.1176, sd 38.7651
    expect(s.statistics!.biasS).toBeCloseTo(-2.1176, 4);
    expect(s.statistics!.sdS).toBeCloseTo(38.7651, 4);
    // Source: check-values §5, limits with ±1.96 s: −78.10 to 73.86
    expect(s.statistics!.lowerS).toBeCloseTo(-78.1, 2);
    expect(s.statistics!.upperS).toBeCloseTo(73.86, 2);
    expect(s.statistics!.multiplier).toBe(1.96);
  });

  it("gives the one-way ICC(1,1), because slot 1 and slot 2 are different reviewers on different drops", () => {
    // The first and second readings of different drops come from whichever reviewers took the
    // slots: Shrout & Fleiss (1979) case 1, not the two-way model of the same two raters on every
    // target (ICC(A,1)) used before. The check is an independent computation of case 1 from its
    // one-way mean squares (lib/stats intraclass itself is checked against Shrout & Fleiss (1979)
    // Table 2 in stats-agreement.test.ts, ICC(1,1) = 0.17 there).
    const rows = WRIGHT.map((w, i) => [w, MINI[i]] as [number, number]);
    const s = summariseAgreement(LANCET);
    expect(s.statistics!.iccForm).toBe("ICC(1,1)");
    expect(s.statistics!.icc11).toBeCloseTo(icc11ByAnova(rows), 10);
    expect(s.statistics!.iccReason).toBeNull();
    // With the second reader 40 later on every drop the two models part (the one-way form counts the
    // shift as disagreement within drops; the two-way form as a rater effect): it is the one-way one.
    const shifted = rows.map(([a, b]) => [a, b + 40] as [number, number]);
    const t = summariseAgreement(shifted.map(([a, b], i) => pair(i, a, b)));
    expect(Math.abs(icc11ByAnova(shifted) - iccA1ByAnova(shifted))).toBeGreaterThan(1e-3);
    expect(t.statistics!.icc11).toBeCloseTo(icc11ByAnova(shifted), 10);
  });

  it("plots each drop at the mean of its readings against first − second", () => {
    const s = summariseAgreement(LANCET);
    expect(s.points[0]).toEqual({
      dropId: "drop-00",
      submissionReference: "S-1",
      sampleSerial: "B1",
      ordinal: 1,
      meanS: (494 + 512) / 2,
      differenceS: 494 - 512,
    });
    expect(s.points).toHaveLength(17);
  });

  it("has no statistics, and says why, with fewer than two pairs", () => {
    const none = summariseAgreement([]);
    expect(none).toMatchObject({ n: 0, statistics: null, points: [], reviewers: [], largest: [] });
    expect(none.reason).toMatch(/No drop in this period has two submitted readings/);
    const one = summariseAgreement([pair(1, 30, 31, { agreedS: 30.5 })]);
    expect(one.statistics).toBeNull();
    expect(one.reason).toMatch(/at least two/);
    // The per-reviewer table and the largest disagreement are still shown for the one drop.
    expect(one.largest).toHaveLength(1);
    expect(one.reviewers.map((r) => [r.reviewerName, r.n, r.meanS, r.sdS])).toEqual([
      ["Ann Tester", 1, -0.5, null],
      ["Ben Tester", 1, 0.5, null],
    ]);
  });

  it("gives no ICC, with a reason, when every drop has the same mean time", () => {
    const s = summariseAgreement([pair(1, 30, 31), pair(2, 31, 30)]);
    expect(s.statistics!.biasS).toBeCloseTo(0, 12);
    expect(s.statistics!.icc11).toBeNull();
    expect(s.statistics!.iccReason).toMatch(/differ from one another/);
  });
});

describe("reviewerBias", () => {
  it("averages reading − agreed value over the drops that have one, in either slot (arithmetic)", () => {
    const pairs = [
      pair(1, 30.2, 30.0, { agreedS: 30.1 }), // Ann +0.1, Ben −0.1
      pair(2, 41.0, 40.6, { agreedS: 40.8 }), // Ann +0.2, Ben −0.2
      pair(3, 50.0, 58.0, { agreedS: null }), // a discrepancy not yet ruled: left out
      pair(4, 22.0, 22.6, { first: { ...CAL, timeS: 22.0 }, second: { ...ANN, timeS: 22.6 }, agreedS: 22.4 }), // Cal −0.4, Ann +0.2
    ];
    const byName = Object.fromEntries(reviewerBias(pairs).map((r) => [r.reviewerName, r]));
    expect(Object.keys(byName)).toEqual(["Ann Tester", "Ben Tester", "Cal Tester"]);
    expect(byName["Ann Tester"].n).toBe(3);
    expect(byName["Ann Tester"].meanS).toBeCloseTo((0.1 + 0.2 + 0.2) / 3, 12);
    // sd of 0.1, 0.2, 0.2 (n − 1 divisor) = √(1/300)
    expect(byName["Ann Tester"].sdS).toBeCloseTo(Math.sqrt(1 / 300), 12);
    expect(byName["Ben Tester"].n).toBe(2);
    expect(byName["Ben Tester"].meanS).toBeCloseTo(-0.15, 12);
    expect(byName["Ben Tester"].sdS).toBeCloseTo(Math.sqrt(0.005), 12);
    expect(byName["Cal Tester"]).toMatchObject({ n: 1, sdS: null });
    expect(byName["Cal Tester"].meanS).toBeCloseTo(-0.4, 12);
  });

  it("lists a reviewer whose drops have no agreed value yet with n = 0 and no mean", () => {
    expect(reviewerBias([pair(1, 50, 58)]).map((r) => [r.n, r.meanS, r.sdS])).toEqual([
      [0, null, null],
      [0, null, null],
    ]);
  });
});

describe("largestDisagreements", () => {
  it("orders by |first − second| whatever the sign, and keeps ten", () => {
    const largest = largestDisagreements(LANCET);
    expect(largest).toHaveLength(10);
    // Differences Wright − Mini, largest in size: 178 − 259 = −81, 423 − 350 = +73, 442 − 380 = +62, 413 − 364 = +49.
    expect(largest.slice(0, 4).map((p) => p.differenceS)).toEqual([-81, 73, 62, 49]);
    const sizes = largest.map((p) => Math.abs(p.differenceS));
    expect([...sizes].sort((a, b) => b - a)).toEqual(sizes);
  });

  it("breaks ties by the most recently settled", () => {
    const older = pair(1, 30, 32, { settledAt: "2026-03-01T00:00:00.000Z" });
    const newer = pair(2, 32, 30, { settledAt: "2026-03-05T00:00:00.000Z" });
    expect(largestDisagreements([older, newer]).map((p) => p.dropId)).toEqual(["drop-02", "drop-01"]);
  });
});
