import type { BallResult, ResultLimits } from "./rules";

// How results are said in words: seconds to one decimal, percentages without trailing zeros.

export function secs(v: number, digits = 1): string {
  return `${v.toFixed(digits)} s`;
}

/** A value compared with a limit: one decimal, more when one would round it onto the limit. */
export function secsAgainst(v: number, limit: number): string {
  const digits = [1, 2].find((d) => Number(v.toFixed(d)) !== limit) ?? 3;
  return secs(v, digits);
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

/** "HL-2003 (141.2 s), HL-2005 (143.0 s)". */
export function ballList(balls: BallResult[]): string {
  return balls.map((b) => `${b.serial} (${secs(b.value as number)})`).join(", ");
}

/** Joins the non-empty sentences with single spaces. */
export function sentences(...parts: string[]): string {
  return parts.filter((p) => p.trim() !== "").join(" ");
}
