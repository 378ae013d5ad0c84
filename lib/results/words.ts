import { digitsAgainst, signed } from "../numbers";
import type { BallResult, ResultLimits } from "./rules";

// How results are said in words: seconds to one decimal (more where a value would otherwise read
// as on or across a limit), percentages without trailing zeros, a true minus sign.

export function secs(v: number, digits = 1): string {
  return `${signed(v, digits)} s`;
}

/** A value compared with limits, in seconds: one decimal (or `min`), more when fewer would put it on or across a limit. */
export function secsAgainst(v: number, thresholds: number | readonly number[], min = 1): string {
  const list = typeof thresholds === "number" ? [thresholds] : thresholds;
  return secs(v, digitsAgainst(v, list, min));
}

/** The limits a ball's judged value is compared with: the minimum and the top of its guard band. */
export function judgedThresholds(limits: Pick<ResultLimits, "minAbsorptionS" | "guardBandS">): number[] {
  return [limits.minAbsorptionS, limits.minAbsorptionS + limits.guardBandS];
}

/** An edition's value as set: 135 → "135 s", 0.3 → "0.3 s". */
export function limitSecs(v: number): string {
  return `${Number(v.toFixed(3))} s`;
}

/** 0.95 → "95 %", 0.999 → "99.9 %", 0.0042 with 2 digits → "0.42 %". */
export function pct(p: number, digits = 1): string {
  const shown = Number((p * 100).toFixed(digits));
  // A small fraction is not none: say how small instead of rounding it to zero.
  if (shown === 0 && p > 0) return `less than ${(10 ** -digits).toFixed(digits)} %`;
  return `${shown.toString()} %`;
}

/** What the criterion judges for a ball, in words: "ball mean" or "shortest drop". */
export function judged(limits: Pick<ResultLimits, "criterion">): string {
  return limits.criterion === "every_drop" ? "shortest drop" : "ball mean";
}

/** The criterion applied to all balls: "every ball mean" or "every drop time". */
export function everyJudged(limits: Pick<ResultLimits, "criterion">): string {
  return limits.criterion === "every_drop" ? "every drop time" : "every ball mean";
}

/** "HL-2003 (141.2 s), HL-2005 (134.96 s)": each judged value with the decimals its status needs. */
export function ballList(balls: BallResult[], limits: Pick<ResultLimits, "minAbsorptionS" | "guardBandS">): string {
  return balls.map((b) => `${b.serial} (${secsAgainst(b.value as number, judgedThresholds(limits))})`).join(", ");
}

/** Joins the non-empty sentences with single spaces. */
export function sentences(...parts: string[]): string {
  return parts.filter((p) => p.trim() !== "").join(" ");
}
