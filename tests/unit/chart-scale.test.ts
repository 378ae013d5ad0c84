import { describe, expect, it } from "vitest";
import { niceScale } from "@/components/charts/scale";

// Axis arithmetic (common practice: ticks at 1, 2 or 5 × 10ⁿ).
describe("niceScale", () => {
  it("covers the values with round ends and evenly spaced ticks", () => {
    const s = niceScale([-1.487, 0.687, -1.2, 0.04]);
    expect(s.domain).toEqual([-2, 1]);
    expect(s.ticks).toEqual([-2, -1.5, -1, -0.5, 0, 0.5, 1]);
    expect(s.format(-1.5)).toBe("−1.5");
    expect(s.format(0)).toBe("0.0");
  });

  it("keeps room so no value sits on the frame", () => {
    const s = niceScale([1.04, 2.2]);
    expect(s.domain[0]).toBeLessThan(1.04);
    expect(s.domain[1]).toBeGreaterThan(2.2);
    expect(s.ticks.every((t) => Number.isFinite(t))).toBe(true);
    expect(s.ticks[0]).toBe(s.domain[0]);
    expect(s.ticks.at(-1)).toBe(s.domain[1]);
  });

  it("widens a single value and whole numbers need no decimals", () => {
    expect(niceScale([30]).domain[0]).toBeLessThan(30);
    expect(niceScale([30]).domain[1]).toBeGreaterThan(30);
    expect(niceScale([0, 100]).format(20)).toBe("20");
    expect(niceScale([]).ticks.length).toBeGreaterThan(1);
  });
});
