import { mean, sampleStandardDeviation } from "simple-statistics";
import { digitsAgainst } from "../numbers";

// Checks of a run's conditions against its edition's limits. Pure: the limits always come from
// the specification edition, never from constants here.

export interface ConditionLimits {
  minAcclimationH: number;
  surfaceTempMinC: number;
  surfaceTempMaxC: number;
  roughnessMaxSdUm: number;
}

export interface ConditionInput {
  testedAt: Date;
  acclimationStartedAt: Date | null;
  surfaceTempC: number;
  roughnessRaUm: number[];
}

export type FlagCode = "acclimation_missing" | "acclimation_short" | "surface_temp" | "roughness_spread";

export interface ConditionFlag {
  code: FlagCode;
  message: string;
}

export interface RoughnessSummary {
  n: number;
  mean: number | null;
  sd: number | null;
}

export function roughnessSummary(ra: number[]): RoughnessSummary {
  return {
    n: ra.length,
    mean: ra.length ? mean(ra) : null,
    sd: ra.length >= 2 ? sampleStandardDeviation(ra) : null,
  };
}

export function acclimationHours(c: ConditionInput): number | null {
  return c.acclimationStartedAt ? (c.testedAt.getTime() - c.acclimationStartedAt.getTime()) / 3_600_000 : null;
}

export function conditionFlags(limits: ConditionLimits, c: ConditionInput): ConditionFlag[] {
  const flags: ConditionFlag[] = [];
  const hours = acclimationHours(c);
  if (hours === null) {
    flags.push({ code: "acclimation_missing", message: "The sample's acclimation start is not recorded, so its acclimation cannot be checked." });
  } else if (hours < limits.minAcclimationH) {
    flags.push({
      code: "acclimation_short",
      message: `Acclimated for ${hours.toFixed(digitsAgainst(hours, [limits.minAcclimationH]))} h before the test; the edition asks for at least ${limits.minAcclimationH} h.`,
    });
  }
  if (c.surfaceTempC < limits.surfaceTempMinC || c.surfaceTempC > limits.surfaceTempMaxC) {
    flags.push({
      code: "surface_temp",
      message: `Surface temperature ${c.surfaceTempC.toFixed(digitsAgainst(c.surfaceTempC, [limits.surfaceTempMinC, limits.surfaceTempMaxC]))} °C is outside the edition's window of ${limits.surfaceTempMinC}–${limits.surfaceTempMaxC} °C.`,
    });
  }
  const r = roughnessSummary(c.roughnessRaUm);
  if (r.sd !== null && r.sd > limits.roughnessMaxSdUm) {
    flags.push({
      code: "roughness_spread",
      message: `Roughness readings vary by SD ${r.sd.toFixed(digitsAgainst(r.sd, [limits.roughnessMaxSdUm], 3))} µm; the edition allows at most ${limits.roughnessMaxSdUm} µm.`,
    });
  }
  return flags;
}
