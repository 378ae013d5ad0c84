import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { blandAltman, intraclass, pooledRepeatability, REPEATABILITY_FACTOR } from "@/lib/stats";

// Source: Shrout & Fleiss (1979), Psychological Bulletin 86(2), Table 2 (six targets, four judges).
const SHROUT_FLEISS = [
  [9, 2, 5, 8],
  [6, 1, 3, 2],
  [8, 4, 6, 8],
  [7, 1, 2, 6],
  [10, 5, 6, 9],
  [6, 2, 4, 7],
];

describe("intraclass", () => {
  it("matches Shrout & Fleiss Table 2 to 4 decimals", () => {
    const { single, average } = intraclass(SHROUT_FLEISS);
    // Source: Shrout & Fleiss (1979), Table 2 (four-decimal values as from general-purpose statistics packages)
    expect(single.oneWay).toBeCloseTo(0.1657, 4); // ICC(1,1)
    expect(single.absolute).toBeCloseTo(0.2898, 4); // ICC(2,1) = ICC(A,1)
    expect(single.consistency).toBeCloseTo(0.7148, 4); // ICC(3,1) = ICC(C,1)
    expect(average.oneWay).toBeCloseTo(0.4428, 4); // ICC(1,k)
    expect(average.absolute).toBeCloseTo(0.6201, 4); // ICC(2,k) = ICC(A,k)
    expect(average.consistency).toBeCloseTo(0.9093, 4); // ICC(3,k) = ICC(C,k)
  });

  it("refuses ragged or too small tables", () => {
    expect(() => intraclass([[1, 2]])).toThrow(/at least 2 targets/);
    expect(() => intraclass([[1], [2]])).toThrow(/at least 2 raters/);
    expect(() => intraclass([[1, 2], [3]])).toThrow(/equal length/);
  });

  it("consistency ignores a constant added to one rater (property)", () => {
    fc.assert(
      fc.property(fc.double({ min: -20, max: 20, noNaN: true }), (c) => {
        const shifted = SHROUT_FLEISS.map((row) => [row[0] + c, ...row.slice(1)]);
        expect(intraclass(shifted).single.consistency).toBeCloseTo(0.7148407, 6);
      }),
      { numRuns: 50 },
    );
  });
});

describe("pooledRepeatability (ISO 5725-2)", () => {
  it("reads the Shrout & Fleiss table as 6 cells of 4", () => {
    const { sr, r } = pooledRepeatability(SHROUT_FLEISS);
    // Source: ISO 5725-2 pooling; check-values §7 (computed): within-cell mean square 6.2639, s_r 2.503, r 7.01
    expect(sr * sr).toBeCloseTo(6.2639, 4);
    expect(sr).toBeCloseTo(2.503, 3);
    expect(r).toBeCloseTo(7.01, 2);
  });

  it("uses 2.8 ≈ 1.96·√2", () => {
    expect(REPEATABILITY_FACTOR).toBe(2.8);
    expect(1.96 * Math.SQRT2).toBeCloseTo(REPEATABILITY_FACTOR, 1);
  });

  it("weights groups by their degrees of freedom (arithmetic)", () => {
    // Variances 1 (df 1) and 4 (df 2): (1 + 8)/3 = 3.
    expect(pooledRepeatability([[0, Math.SQRT2], [0, 2, 4], [7]]).sr ** 2).toBeCloseTo(3, 12);
  });

  it("refuses groups without spread to pool", () => {
    expect(() => pooledRepeatability([])).toThrow(/at least one group/);
    expect(() => pooledRepeatability([[1], [2]])).toThrow(/2 or more values/);
    expect(() => pooledRepeatability([[1, 2], []])).toThrow(/at least 1 values/);
  });
});

// Source: Bland & Altman (1986), Lancet 1(8476):307–310, peak expiratory flow, first readings.
const WRIGHT = [494, 395, 516, 434, 476, 557, 413, 442, 650, 433, 417, 656, 267, 478, 178, 423, 427];
const MINI = [512, 430, 520, 428, 500, 600, 364, 380, 658, 445, 432, 626, 260, 477, 259, 350, 451];

describe("blandAltman", () => {
  it("gives the Wright − Mini bias, sd and 1.96 s limits", () => {
    const r = blandAltman(WRIGHT, MINI);
    // Source: Bland & Altman (1986), Lancet 1(8476):307–310: mean −2.1176, sd 38.7651, limits −78.10 / 73.86
    expect(r.bias).toBeCloseTo(-2.1176, 4);
    expect(r.sd).toBeCloseTo(38.7651, 4);
    expect(r.lower).toBeCloseTo(-78.1, 2);
    expect(r.upper).toBeCloseTo(73.86, 2);
  });

  it("gives the paper's ±2 s limits", () => {
    const r = blandAltman(WRIGHT, MINI, 2);
    // Source: Bland & Altman (1986): −79.7 to 75.5 (from memory, consistent with the data), to 0.1
    expect(Math.abs(r.lower - -79.7)).toBeLessThanOrEqual(0.1);
    expect(Math.abs(r.upper - 75.5)).toBeLessThanOrEqual(0.1);
  });

  it("mirrors when the methods swap (property)", () => {
    const pair = fc
      .integer({ min: 2, max: 30 })
      .chain((n) =>
        fc.tuple(
          fc.array(fc.double({ min: 0, max: 1000, noNaN: true }), { minLength: n, maxLength: n }),
          fc.array(fc.double({ min: 0, max: 1000, noNaN: true }), { minLength: n, maxLength: n }),
        ),
      );
    fc.assert(
      fc.property(pair, ([a, b]) => {
        const ab = blandAltman(a, b);
        const ba = blandAltman(b, a);
        expect(ba.bias).toBeCloseTo(-ab.bias, 8);
        expect(ba.sd).toBeCloseTo(ab.sd, 8);
        expect(ba.lower).toBeCloseTo(-ab.upper, 8);
        expect(ba.upper).toBeCloseTo(-ab.lower, 8);
      }),
      { numRuns: 60 },
    );
  });

  it("refuses unpaired input", () => {
    expect(() => blandAltman([1, 2, 3], [1, 2])).toThrow(/same number/);
    expect(() => blandAltman([1], [1])).toThrow(/at least 2 values/);
    expect(() => blandAltman([1, 2], [1, 3], 0)).toThrow(/positive number/);
  });
});
