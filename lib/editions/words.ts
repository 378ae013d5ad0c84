import { BELOW_MINIMUM_RULE_LABELS, type BelowMinimumRule } from "./schema";

// An edition said in one sentence, for the pages that name the edition a submission is judged by.

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/** "Demo edition: 3 drops per ball, at least 135 s absorption time; a ball below the minimum fails the submission on its own." */
export function editionInBrief(e: { name: string; dropsPerBall: number; minAbsorptionS: number; belowMinimumRule: BelowMinimumRule }): string {
  return `${e.name}: ${plural(e.dropsPerBall, "drop", "drops")} per ball, at least ${e.minAbsorptionS} s absorption time; a ball below the minimum ${BELOW_MINIMUM_RULE_LABELS[e.belowMinimumRule]}.`;
}
