import { describe, expect, it } from "vitest";
import { hoursAndMinutes } from "@/lib/numbers";
import { conditionFlags, roughnessSummary } from "@/lib/runs/conditions";

// Limits as an edition would give them (values invented for the test).
const limits = { minAcclimationH: 24, surfaceTempMinC: 20, surfaceTempMaxC: 24, roughnessMaxSdUm: 0.1 };
const start = new Date("2026-11-30T08:00:00Z");
const hoursLater = (h: number) => new Date(start.getTime() + h * 3_600_000);
const good = { testedAt: hoursLater(26), acclimationStartedAt: start, surfaceTempC: 22, roughnessRaUm: [0.42, 0.45, 0.44] };

describe("conditionFlags", () => {
  it("raises nothing for a run inside every limit", () => {
    expect(conditionFlags(limits, good)).toEqual([]);
  });

  it("flags a short acclimation, in words with both numbers", () => {
    const [flag] = conditionFlags(limits, { ...good, testedAt: hoursLater(14.5) });
    expect(flag).toEqual({ code: "acclimation_short", message: "Acclimated for 14.5 h before the test; the edition asks for at least 24 h." });
  });

  it("takes exactly the minimum acclimation as enough, and one second less as short", () => {
    expect(conditionFlags(limits, { ...good, testedAt: hoursLater(24) })).toEqual([]);
    expect(conditionFlags(limits, { ...good, testedAt: new Date(hoursLater(24).getTime() - 1000) }).map((f) => f.code)).toEqual(["acclimation_short"]);
    // The same at a minimum that is not a whole number of hours (an example edition value).
    const odd = { ...limits, minAcclimationH: 16.25 };
    expect(conditionFlags(odd, { ...good, testedAt: hoursLater(16.25) })).toEqual([]);
    expect(conditionFlags(odd, { ...good, testedAt: new Date(hoursLater(16.25).getTime() - 1000) }).map((f) => f.code)).toEqual(["acclimation_short"]);
  });

  it("writes a flagged value with the decimals that keep it on its side of the limit", () => {
    // One second short of 24 h would round to "24.0 h", which reads as enough.
    const [short] = conditionFlags(limits, { ...good, testedAt: new Date(hoursLater(24).getTime() - 1000) });
    expect(short.message).toBe("Acclimated for 23.9997 h before the test; the edition asks for at least 24 h.");
    expect(conditionFlags(limits, { ...good, surfaceTempC: 24.04 })[0].message).toBe(
      "Surface temperature 24.04 °C is outside the edition's window of 20–24 °C.",
    );
    expect(conditionFlags(limits, { ...good, surfaceTempC: 19.96 })[0].message).toBe(
      "Surface temperature 19.96 °C is outside the edition's window of 20–24 °C.",
    );
    // Readings 0.3 and 0.4414: SD 0.10000… just over 0.1 (arithmetic: |0.1414| / √2).
    const [spread] = conditionFlags(limits, { ...good, roughnessRaUm: [0.3, 0.44143] });
    expect(spread.message).toMatch(/^Roughness readings vary by SD 0\.1000\d+ µm; the edition allows at most 0\.1 µm\.$/);
  });

  it("flags a missing acclimation start", () => {
    expect(conditionFlags(limits, { ...good, acclimationStartedAt: null }).map((f) => f.code)).toEqual(["acclimation_missing"]);
  });

  it("flags a surface temperature outside the window, and not on its edges", () => {
    expect(conditionFlags(limits, { ...good, surfaceTempC: 26.67 })[0].message).toBe(
      "Surface temperature 26.7 °C is outside the edition's window of 20–24 °C.",
    );
    expect(conditionFlags(limits, { ...good, surfaceTempC: 19.99 })).toHaveLength(1);
    expect(conditionFlags(limits, { ...good, surfaceTempC: 20 })).toEqual([]);
    expect(conditionFlags(limits, { ...good, surfaceTempC: 24 })).toEqual([]);
  });

  it("flags roughness readings that vary more than the edition allows", () => {
    const flags = conditionFlags(limits, { ...good, roughnessRaUm: [0.2, 0.5, 0.35] });
    expect(flags.map((f) => f.code)).toEqual(["roughness_spread"]);
    expect(flags[0].message).toBe("Roughness readings vary by SD 0.150 µm; the edition allows at most 0.1 µm.");
  });

  it("raises every flag that applies at once", () => {
    expect(
      conditionFlags(limits, { testedAt: hoursLater(2), acclimationStartedAt: start, surfaceTempC: 30, roughnessRaUm: [0.1, 0.9] }).map((f) => f.code),
    ).toEqual(["acclimation_short", "surface_temp", "roughness_spread"]);
  });
});

describe("roughnessSummary", () => {
  it("gives the mean and the sample standard deviation (n − 1)", () => {
    // 0.2, 0.5, 0.35: mean 0.35, sample variance ((0.15)² + (0.15)² + 0)/2 = 0.0225, SD 0.15 (arithmetic).
    const r = roughnessSummary([0.2, 0.5, 0.35]);
    expect(r.n).toBe(3);
    expect(r.mean).toBeCloseTo(0.35, 12);
    expect(r.sd).toBeCloseTo(0.15, 12);
  });

  it("has no SD for fewer than two readings", () => {
    expect(roughnessSummary([0.4])).toEqual({ n: 1, mean: 0.4, sd: null });
    expect(roughnessSummary([])).toEqual({ n: 0, mean: null, sd: null });
  });
});

describe("hoursAndMinutes", () => {
  it("rounds down to the minute, so one second short of 24 h never reads as 24 h", () => {
    expect(hoursAndMinutes(24 - 1 / 3600)).toBe("23 h 59 min");
    expect(hoursAndMinutes(24)).toBe("24 h 0 min");
    expect(hoursAndMinutes(16.25)).toBe("16 h 15 min");
    expect(hoursAndMinutes(0.1)).toBe("0 h 6 min");
  });
});
