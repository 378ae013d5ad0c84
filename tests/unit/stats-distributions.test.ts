import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { logGamma, nonCentralTCdf, normalCdf, normalQuantile, regularizedBeta, studentTCdf, studentTQuantile } from "@/lib/stats";

describe("special functions", () => {
  it("log-gamma of known values (arithmetic: Γ(½) = √π, Γ(10) = 9!)", () => {
    expect(logGamma(0.5)).toBeCloseTo(Math.log(Math.sqrt(Math.PI)), 13);
    expect(logGamma(10)).toBeCloseTo(Math.log(362880), 12);
    expect(logGamma(1)).toBeCloseTo(0, 13);
  });
  it("incomplete beta of closed forms (arithmetic: I_x(1, b) = 1 − (1 − x)^b, I_x(a, 1) = x^a)", () => {
    expect(regularizedBeta(0.3, 1, 4.5)).toBeCloseTo(1 - 0.7 ** 4.5, 13);
    expect(regularizedBeta(0.3, 2.5, 1)).toBeCloseTo(0.3 ** 2.5, 13);
    expect(regularizedBeta(0.5, 7, 7)).toBeCloseTo(0.5, 13);
  });
  it("normal CDF and quantile (standard table values: Φ(−3) = 0.001350, z_0.975 = 1.959964)", () => {
    expect(normalCdf(-3)).toBeCloseTo(0.0013499, 7);
    expect(normalQuantile(0.975)).toBeCloseTo(1.959964, 6);
    expect(normalQuantile(0.95)).toBeCloseTo(1.644854, 6);
    expect(normalCdf(normalQuantile(1e-9))).toBeCloseTo(1e-9, 15);
  });
  it("Student t (closed forms: df = 1 is Cauchy, df = 2 is t/√(t²+2)·½ + ½)", () => {
    expect(studentTCdf(1, 1)).toBeCloseTo(0.75, 13);
    expect(studentTCdf(2, 2)).toBeCloseTo(0.5 + 1 / Math.sqrt(6), 13);
    // Near zero the CDF is ½ + t·Γ((ν+1)/2)/(√(νπ)Γ(ν/2)); at ν = 2 that slope is 1/(2√2).
    expect((studentTCdf(1e-9, 2) - 0.5) / 1e-9).toBeCloseTo(1 / (2 * Math.SQRT2), 5);
    expect(studentTQuantile(0.975, 1)).toBeCloseTo(Math.tan(Math.PI * 0.475), 9);
    // Standard t table: t_0.975(10) = 2.228.
    expect(studentTQuantile(0.975, 10)).toBeCloseTo(2.228139, 5);
  });
  it("refuses bad input", () => {
    expect(() => normalQuantile(1)).toThrow(/between 0 and 1/);
    expect(() => studentTCdf(1, 0)).toThrow(/Degrees of freedom/);
    expect(() => nonCentralTCdf(1, 5, Infinity)).toThrow(/needs numbers/);
  });
});

describe("noncentral t CDF", () => {
  it("with δ = 0 equals the Student t CDF (property)", () => {
    fc.assert(
      fc.property(fc.double({ min: -20, max: 20, noNaN: true }), fc.integer({ min: 1, max: 100 }), (t, df) => {
        expect(Math.abs(nonCentralTCdf(t, df, 0) - studentTCdf(t, df))).toBeLessThan(1e-12);
      }),
      { numRuns: 100 },
    );
  });
  it("rises with t, to within rounding of 1e-14 (property)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: -10, max: 30, noNaN: true }),
        fc.double({ min: 0.01, max: 5, noNaN: true }),
        fc.integer({ min: 1, max: 60 }),
        fc.double({ min: -5, max: 20, noNaN: true }),
        (t, dt, df, delta) => {
          expect(nonCentralTCdf(t + dt, df, delta)).toBeGreaterThanOrEqual(nonCentralTCdf(t, df, delta) - 1e-14);
        },
      ),
      { numRuns: 100 },
    );
  });
  it("computes any noncentrality: δ = 40, 80 and 160 (beyond where a series started at j = 0 underflows)", () => {
    // Many degrees of freedom: T′ ≈ N(δ, 1 + δ²/(2ν)) (delta method, arithmetic), so at t = δ the CDF is
    // about ½ and one standard deviation above it about Φ(1).
    for (const delta of [40, 80, 160]) {
      const sd = Math.sqrt(1 + (delta * delta) / (2 * 1e6));
      expect(nonCentralTCdf(delta + sd, 1e6, delta)).toBeCloseTo(normalCdf(1), 3);
      expect(nonCentralTCdf(delta / 2, 50, delta)).toBeLessThan(0.01);
      expect(nonCentralTCdf(delta * 3, 50, delta)).toBeGreaterThan(0.99);
    }
  });
  it("rises with t for large noncentralities too (property)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 20, max: 200, noNaN: true }),
        fc.double({ min: 0.01, max: 20, noNaN: true }),
        fc.integer({ min: 10, max: 2000 }),
        (t, dt, df) => {
          const delta = 37 + (t % 100);
          expect(nonCentralTCdf(t + dt, df, delta)).toBeGreaterThanOrEqual(nonCentralTCdf(t, df, delta) - 1e-14);
        },
      ),
      { numRuns: 100 },
    );
  });
  it("tends to Φ(t − δ) for many degrees of freedom (limit, arithmetic)", () => {
    expect(nonCentralTCdf(2.5, 1e6, 2)).toBeCloseTo(normalCdf(0.5), 4);
  });
});
