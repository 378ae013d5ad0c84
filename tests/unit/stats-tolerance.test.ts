import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { lowerToleranceLimit, natrellaFactor, toleranceFactor } from "@/lib/stats";

// Source: Montgomery & Runger, Applied Statistics and Probability for Engineers, table of one-sided
// tolerance factors (the same exact factors as Natrella, NBS Handbook 91, Table A-7); to ±0.002.
const AT_95: [number, number, number, number][] = [
  [8, 2.582, 3.187, 4.354],
  [10, 2.355, 2.911, 3.981],
  [20, 1.926, 2.396, 3.295],
  [24, 1.853, 2.309, 3.181],
  [30, 1.777, 2.22, 3.064],
  [40, 1.697, 2.125, 2.941],
];
const AT_99: [number, number, number, number][] = [
  [10, 3.048, 3.738, 5.074],
  [24, 2.154, 2.662, 3.64],
];

describe("toleranceFactor (exact, noncentral t)", () => {
  for (const [confidence, table] of [
    [0.95, AT_95],
    [0.99, AT_99],
  ] as const) {
    for (const [n, ...ks] of table) {
      it(`matches Montgomery & Runger at n = ${n}, confidence ${confidence}`, () => {
        [0.9, 0.95, 0.99].forEach((p, i) => {
          // Source: Montgomery & Runger table (= Natrella, NBS Handbook 91, Table A-7), ±0.002
          expect(Math.abs(toleranceFactor(n, p, confidence) - ks[i])).toBeLessThanOrEqual(0.002);
        });
      });
    }
  }

  it("gives the NIST worked example N = 43, p = 0.90, γ = 0.99", () => {
    // Source: NIST/SEMATECH e-Handbook of Statistical Methods, §7.2.6.3: exact k = 1.8740
    expect(Math.abs(toleranceFactor(43, 0.9, 0.99) - 1.874)).toBeLessThanOrEqual(0.0005);
  });

  it("computes the factor for as many balls as a lab can have (253 balls and more at 99 % coverage)", () => {
    // Source: values computed with SciPy 1.17, scipy.stats.nct.ppf(γ, n − 1, z_p·√n)/√n.
    expect(toleranceFactor(300, 0.99, 0.95)).toBeCloseTo(2.5219, 4);
    expect(toleranceFactor(1000, 0.99, 0.99)).toBeCloseTo(2.4746, 4);
    // Either side of the old limit (δ = z_0.99·√n passes 37 at n = 253) the factor falls smoothly with n.
    const ks = [250, 252, 253, 254, 260].map((n) => toleranceFactor(n, 0.99, 0.95));
    ks.slice(1).forEach((k, i) => expect(k).toBeLessThan(ks[i]));
    // For very large n the factor tends to z_p (arithmetic: s → σ and the mean → μ).
    expect(toleranceFactor(100_000, 0.99, 0.95)).toBeCloseTo(2.3263 + 0.0137, 2);
  });

  it("refuses bad input in words", () => {
    expect(() => toleranceFactor(1, 0.9, 0.95)).toThrow(/at least 2 values/);
    expect(() => toleranceFactor(10.5, 0.9, 0.95)).toThrow(/whole number/);
    expect(() => toleranceFactor(10, 1, 0.95)).toThrow(/coverage must be between 0 and 1/);
    expect(() => toleranceFactor(10, 0.9, 0)).toThrow(/confidence must be between 0 and 1/);
  });

  it("falls as n grows (property)", () => {
    fc.assert(
      fc.property(fc.integer({ min: 3, max: 59 }), fc.constantFrom(0.9, 0.95, 0.99), fc.constantFrom(0.9, 0.95, 0.99), (n, p, g) => {
        expect(toleranceFactor(n + 1, p, g)).toBeLessThan(toleranceFactor(n, p, g));
      }),
      { numRuns: 60 },
    );
  });

  it("rises with coverage and with confidence (property)", () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 3, max: 60 }),
        fc.double({ min: 0.6, max: 0.98, noNaN: true }),
        fc.double({ min: 0.6, max: 0.98, noNaN: true }),
        (n, p, g) => {
          const k = toleranceFactor(n, p, g);
          expect(toleranceFactor(n, p + 0.01, g)).toBeGreaterThan(k);
          expect(toleranceFactor(n, p, g + 0.01)).toBeGreaterThan(k);
        },
      ),
      { numRuns: 50 },
    );
  });
});

describe("natrellaFactor (closed-form approximation)", () => {
  it("gives the NIST worked example", () => {
    // Source: NIST/SEMATECH e-Handbook of Statistical Methods, §7.2.6.3: Natrella approximation 1.8752
    expect(natrellaFactor(43, 0.9, 0.99)).toBeCloseTo(1.8752, 4);
  });

  it("is within 6 % of the exact factor for n ≥ 10 (property; 5.5 % at worst, n = 10)", () => {
    fc.assert(
      fc.property(fc.integer({ min: 10, max: 80 }), fc.constantFrom(0.9, 0.95, 0.99), fc.constantFrom(0.9, 0.95, 0.99), (n, p, g) => {
        const exact = toleranceFactor(n, p, g);
        expect(Math.abs(natrellaFactor(n, p, g) - exact) / exact).toBeLessThan(0.06);
      }),
      { numRuns: 60 },
    );
  });

  it("refuses a sample too small for the approximation", () => {
    expect(() => natrellaFactor(2, 0.99, 0.99)).toThrow(/does not apply/);
  });
});

describe("lowerToleranceLimit", () => {
  it("is mean − k·s with the sample sd and the exact k (arithmetic)", () => {
    const values = [140, 150, 145, 155, 160, 150, 148, 152];
    const { mean, sd, k, limit } = lowerToleranceLimit(values, 0.95, 0.95);
    expect(mean).toBeCloseTo(150, 12);
    expect(sd).toBeCloseTo(Math.sqrt(258 / 7), 12);
    expect(k).toBe(toleranceFactor(8, 0.95, 0.95));
    expect(limit).toBeCloseTo(mean - k * sd, 12);
    // Identity (algebra): mean − k·s ≥ L is the same statement as (mean − L)/(3s) ≥ k/3.
    for (const L of [100, 130, 135]) expect(limit >= L).toBe((mean - L) / (3 * sd) >= k / 3);
  });

  it("refuses fewer than 2 values", () => {
    expect(() => lowerToleranceLimit([150], 0.95, 0.95)).toThrow(/at least 2 values/);
  });

  it("shifts with a constant and scales with a positive factor (property)", () => {
    const sample = fc.array(fc.double({ min: 100, max: 200, noNaN: true }), { minLength: 3, maxLength: 30 });
    fc.assert(
      fc.property(sample, fc.double({ min: -50, max: 50, noNaN: true }), fc.double({ min: 0.1, max: 10, noNaN: true }), (xs, c, f) => {
        const base = lowerToleranceLimit(xs, 0.95, 0.95);
        const shifted = lowerToleranceLimit(
          xs.map((x) => x + c),
          0.95,
          0.95,
        );
        const scaled = lowerToleranceLimit(
          xs.map((x) => x * f),
          0.95,
          0.95,
        );
        const tol = 1e-7 * (1 + Math.abs(base.limit) + base.sd);
        expect(Math.abs(shifted.limit - (base.limit + c))).toBeLessThan(tol);
        expect(Math.abs(scaled.limit - base.limit * f)).toBeLessThan(tol * f);
      }),
      { numRuns: 50 },
    );
  });
});
