import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { cpkInterval, fractionBelow } from "@/lib/stats";

describe("fractionBelow", () => {
  it("gives Cpl and Φ((L − mean)/s) (arithmetic: mean 2, s 1, L = 0)", () => {
    const r = fractionBelow([1, 2, 3], 0);
    expect(r.mean).toBe(2);
    expect(r.sd).toBe(1);
    expect(r.cpl).toBeCloseTo(2 / 3, 14);
  });

  it("Cpl = 1 gives a fraction of 0.00135", () => {
    // mean 2, s 1, L = −1: three standard deviations below the mean.
    const r = fractionBelow([1, 2, 3], -1);
    expect(r.cpl).toBeCloseTo(1, 14);
    // Source: standard normal, p̂ = Φ((L − mean)/s) (standard; from memory): Cpl = 1.0 gives p̂ = 0.00135
    expect(r.fraction).toBeCloseTo(0.00135, 5);
  });

  it("refuses too few or all-equal values", () => {
    expect(() => fractionBelow([5], 1)).toThrow(/at least 2 values/);
    expect(() => fractionBelow([5, 5, 5], 1)).toThrow(/not all equal/);
    expect(() => fractionBelow([5, 6], Number.NaN)).toThrow(/finite number/);
  });

  it("rises with the limit (property)", () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: 100, max: 200, noNaN: true }), { minLength: 3, maxLength: 20 }),
        fc.double({ min: 50, max: 250, noNaN: true }),
        fc.double({ min: 0.001, max: 50, noNaN: true }),
        (xs, L, dL) => {
          fc.pre(new Set(xs).size > 1);
          const a = fractionBelow(xs, L);
          const b = fractionBelow(xs, L + dL);
          expect(b.fraction).toBeGreaterThanOrEqual(a.fraction);
          expect(b.cpl).toBeLessThan(a.cpl);
        },
      ),
      { numRuns: 80 },
    );
  });
});

describe("cpkInterval (Bissell)", () => {
  it("Cpk = 1.15, n = 45, 95 % gives 0.89 to 1.41", () => {
    const [lo, hi] = cpkInterval(1.15, 45, 0.95);
    // Source: Bissell (1990) (citation from memory); check as quoted in Quality Digest (May 2000): 0.89 to 1.41
    expect(lo).toBeCloseTo(0.89, 2);
    expect(hi).toBeCloseTo(1.41, 2);
  });

  it("narrows as n grows and is centred on Cpk (property)", () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 3, noNaN: true }), fc.integer({ min: 2, max: 500 }), (cpk, n) => {
        const [lo, hi] = cpkInterval(cpk, n, 0.95);
        const [lo2, hi2] = cpkInterval(cpk, n + 1, 0.95);
        expect((lo + hi) / 2).toBeCloseTo(cpk, 12);
        expect(hi2 - lo2).toBeLessThan(hi - lo);
      }),
      { numRuns: 60 },
    );
  });

  it("refuses bad input", () => {
    expect(() => cpkInterval(1, 1, 0.95)).toThrow(/at least 2 values/);
    expect(() => cpkInterval(1, 10, 1.5)).toThrow(/confidence must be between 0 and 1/);
  });
});
