import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { summarize, welchInterval } from "@/lib/stats";

describe("welchInterval", () => {
  it("matches the NIST/SEMATECH two-sample example (unequal variances)", () => {
    // Source: NIST/SEMATECH e-Handbook of Statistical Methods, §1.3.5.3 (two-sample t-test, AUTO83B
    // data): n 249 and 79, means 20.14458 and 30.48101, sd 6.41470 and 6.10771; with unequal
    // variances T = −12.94627 on 136.8750 df (from memory).
    const r = welchInterval({ n: 249, mean: 20.14458, sd: 6.4147 }, { n: 79, mean: 30.48101, sd: 6.10771 }, 0.95);
    expect(r.difference / r.se).toBeCloseTo(-12.94627, 3);
    expect(r.df).toBeCloseTo(136.875, 2);
    // t(0.975, 136.875) ≈ 1.9774 (Student t tables: 1.977 at 140 df, 1.978 at 130 df).
    expect(r.t).toBeGreaterThan(1.9765);
    expect(r.t).toBeLessThan(1.9785);
  });

  it("matches the worked example of Welch's test on two samples of 15", () => {
    // Source: Wikipedia, "Welch's t-test", examples (from memory): A1 vs A2 gives t = −2.46 on 25.0 df.
    const a1 = [27.5, 21.0, 19.0, 23.6, 17.0, 17.9, 16.9, 20.1, 21.9, 22.6, 23.1, 19.6, 19.0, 21.7, 21.4];
    const a2 = [27.1, 22.0, 20.8, 23.4, 23.4, 23.5, 25.8, 22.0, 24.8, 20.2, 21.9, 22.1, 22.9, 20.5, 24.4];
    const r = welchInterval(summarize(a1), summarize(a2), 0.95);
    expect(r.difference / r.se).toBeCloseTo(-2.46, 2);
    expect(r.df).toBeCloseTo(25.0, 0);
    expect(r.lower).toBeLessThan(0);
    expect(r.upper).toBeLessThan(0);
  });

  it("is antisymmetric when the samples swap, and widens with confidence (property)", () => {
    const summary = fc.record({
      n: fc.integer({ min: 2, max: 40 }),
      mean: fc.double({ min: 100, max: 200, noNaN: true }),
      sd: fc.double({ min: 0.1, max: 20, noNaN: true }),
    });
    fc.assert(
      fc.property(summary, summary, (a, b) => {
        const ab = welchInterval(a, b, 0.95);
        const ba = welchInterval(b, a, 0.95);
        const wide = welchInterval(a, b, 0.99);
        expect(ab.lower).toBeCloseTo(-ba.upper, 9);
        expect(ab.df).toBeCloseTo(ba.df, 9);
        expect(wide.upper - wide.lower).toBeGreaterThan(ab.upper - ab.lower);
      }),
    );
  });

  it("refuses samples too small or without spread", () => {
    expect(() => welchInterval({ n: 1, mean: 5, sd: Number.NaN }, { n: 3, mean: 4, sd: 1 }, 0.95)).toThrow(/at least 2 values/);
    expect(() => welchInterval({ n: 3, mean: 5, sd: 0 }, { n: 3, mean: 4, sd: 0 }, 0.95)).toThrow(/not all equal/);
    expect(() => welchInterval({ n: 3, mean: 5, sd: 1 }, { n: 3, mean: 4, sd: 1 }, 1)).toThrow(/between 0 and 1/);
  });
});
