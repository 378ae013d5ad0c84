import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { dixonQ, grubbs } from "@/lib/stats";

// Source: Rorabacher (1991), Analytical Chemistry 63(2), critical r10 values for n = 3…10.
const RORABACHER: Record<number, number[]> = {
  0.9: [0.941, 0.765, 0.642, 0.56, 0.507, 0.468, 0.437, 0.412],
  0.95: [0.97, 0.829, 0.71, 0.625, 0.568, 0.526, 0.493, 0.466],
  0.99: [0.994, 0.926, 0.821, 0.74, 0.68, 0.634, 0.598, 0.568],
};

describe("dixonQ", () => {
  for (const confidence of [0.9, 0.95, 0.99]) {
    it(`uses Rorabacher's critical values at ${confidence}`, () => {
      for (let n = 3; n <= 10; n++) {
        const values = Array.from({ length: n }, (_, i) => 100 + i);
        // Source: Rorabacher (1991), Analytical Chemistry 63(2)
        expect(dixonQ(values, confidence).critical).toBe(RORABACHER[confidence][n - 3]);
      }
    });
  }

  it("tests both ends and reports the more extreme value", () => {
    const high = dixonQ([130, 131, 132, 150], 0.95); // gap 18, range 20
    expect(high.q).toBeCloseTo(0.9, 12);
    expect(high.suspect).toBe(150);
    expect(high.isOutlier).toBe(true);
    const low = dixonQ([110, 131, 132, 133], 0.95); // gap 21, range 23
    expect(low.q).toBeCloseTo(21 / 23, 12);
    expect(low.suspect).toBe(110);
    expect(low.isOutlier).toBe(true);
    const none = dixonQ([130, 132, 134, 135, 137], 0.95);
    expect(none.isOutlier).toBe(false);
  });

  it("refuses sizes and confidences outside the table", () => {
    expect(() => dixonQ([1, 2], 0.95)).toThrow(/at least 3 values/);
    expect(() =>
      dixonQ(
        Array.from({ length: 11 }, (_, i) => i),
        0.95,
      ),
    ).toThrow(/3 to 10 values/);
    expect(() => dixonQ([1, 2, 3], 0.8)).toThrow(/0.90, 0.95 or 0.99/);
    expect(() => dixonQ([4, 4, 4], 0.95)).toThrow(/not all equal/);
  });
});

describe("grubbs (two-sided)", () => {
  // Source: ISO 5725-2, Grubbs two-sided 5 % critical values, n = 3…10; to ±0.002.
  const ISO_5725_2 = [1.155, 1.481, 1.715, 1.887, 2.02, 2.126, 2.215, 2.29];
  it("matches the ISO 5725-2 5 % critical values for n = 3…10", () => {
    ISO_5725_2.forEach((ref, i) => {
      const n = i + 3;
      const values = Array.from({ length: n }, (_, j) => j * j);
      // Source: ISO 5725-2 (Grubbs, two-sided 5 %), ±0.002
      expect(Math.abs(grubbs(values, 0.05).critical - ref)).toBeLessThanOrEqual(0.002);
    });
  });

  it("finds the value farthest from the mean", () => {
    const r = grubbs([140, 141, 142, 143, 141, 142, 170], 0.05);
    expect(r.suspect).toBe(170);
    expect(r.isOutlier).toBe(true);
    expect(grubbs([140, 141, 142, 143, 141, 142, 144], 0.05).isOutlier).toBe(false);
  });

  it("with three values flags one only when the other two coincide (G at its bound (n−1)/√n)", () => {
    expect(grubbs([130, 131, 160], 0.05).isOutlier).toBe(false);
    const tie = grubbs([130, 130, 160], 0.05);
    expect(tie.g).toBeCloseTo(2 / Math.sqrt(3), 12);
    expect(tie.critical).toBeLessThan(2 / Math.sqrt(3));
  });

  it("G never exceeds (n − 1)/√n (property; ISO 5725-2 note)", () => {
    fc.assert(
      fc.property(
        fc.array(
          fc.integer({ min: -10_000, max: 10_000 }).map((v) => v / 10),
          { minLength: 3, maxLength: 30 },
        ),
        (xs) => {
          fc.pre(new Set(xs).size > 1);
          const n = xs.length;
          const { g, critical } = grubbs(xs, 0.05);
          expect(g).toBeLessThanOrEqual(((n - 1) / Math.sqrt(n)) * (1 + 1e-12));
          expect(critical).toBeLessThan((n - 1) / Math.sqrt(n));
        },
      ),
      { numRuns: 80 },
    );
  });

  it("refuses bad input", () => {
    expect(() => grubbs([1, 2], 0.05)).toThrow(/at least 3 values/);
    expect(() => grubbs([1, 2, 3], 0)).toThrow(/alpha must be between 0 and 1/);
    expect(() => grubbs([2, 2, 2], 0.05)).toThrow(/not all equal/);
  });
});
