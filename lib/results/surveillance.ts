import { summarize, welchInterval, type SampleSummary } from "../stats";
import { toleranceJudgement, type Decision, type ToleranceJudgement } from "./decision";
import type { BallResult, ResultLimits } from "./rules";
import { signed } from "../numbers";
import { judged, limitSecs, pct, secs, secsAgainst, sentences } from "./words";

// Market samples against the approval results of the same model: the difference in means with a
// Welch interval, and the same tolerance judgement on the market samples alone.

export const COMPARISON_CONFIDENCE = 0.95;

export interface SurveillanceComparison {
  approval: { submissionId: string; reference: string; decision: Decision; summary: SampleSummary | null };
  market: { summary: SampleSummary | null; tolerance: ToleranceJudgement | null };
  /** Market − approval, seconds, with its Welch interval; null with fewer than 2 balls on a side. */
  difference: { value: number; lower: number; upper: number; df: number; confidence: number } | null;
  /** null while a market ball has no result yet. */
  stillMeets: boolean | null;
  explanation: string;
}

const valuesOf = (balls: BallResult[]) => balls.filter((b) => b.value !== null).map((b) => b.value as number);

export function compareWithApproval(
  limits: ResultLimits,
  market: BallResult[],
  approval: { submissionId: string; reference: string; decision: Decision; balls: BallResult[] },
): SurveillanceComparison {
  const m = valuesOf(market);
  const a = valuesOf(approval.balls);
  const ms = m.length ? summarize(m) : null;
  const as = a.length ? summarize(a) : null;
  const tolerance = toleranceJudgement(m, limits);
  const head = {
    approval: { submissionId: approval.submissionId, reference: approval.reference, decision: approval.decision, summary: as },
    market: { summary: ms, tolerance },
  };
  const L = limitSecs(limits.minAbsorptionS);
  const what = judged(limits);

  let difference: SurveillanceComparison["difference"] = null;
  if (ms && as && ms.n >= 2 && as.n >= 2 && ms.sd + as.sd > 0) {
    const w = welchInterval(ms, as, COMPARISON_CONFIDENCE);
    difference = { value: w.difference, lower: w.lower, upper: w.upper, df: w.df, confidence: COMPARISON_CONFIDENCE };
  }
  const pending = market.some((b) => b.status === "pending") || !ms;
  const stillMeets = pending ? null : tolerance ? tolerance.passes : (ms as SampleSummary).mean >= limits.minAbsorptionS;

  const compare =
    !ms || !as
      ? `No ${!ms ? "market" : "approval"} ball has a result yet, so the two cannot be compared.`
      : difference
        ? `Market samples (${ms.n} ball${ms.n === 1 ? "" : "s"}) average ${secs(ms.mean)}, ${secs(Math.abs(difference.value))} ${difference.value < 0 ? "below" : "above"} the approval's ${secs(as.mean)} (${pct(difference.confidence)} Welch interval ${signed(difference.lower, 1)} to ${signed(difference.upper, 1)} s).`
        : `Market samples average ${secs(ms.mean)} against the approval's ${secs(as.mean)}; an interval for the difference needs at least 2 balls on each side.`;
  const judgement = pending
    ? "The judgement waits until every market ball has a result."
    : tolerance
      ? `Lower ${pct(tolerance.coverage)}/${pct(tolerance.confidence)} tolerance limit of the market samples ${secsAgainst(tolerance.limit, limits.minAbsorptionS)} is ${tolerance.passes ? "at or above" : "below"} the ${L} minimum: the market samples ${tolerance.passes ? "still meet" : "no longer meet"} the limit.`
      : `With one market ball there is no tolerance limit; its ${what} ${secs(m[0])} is ${stillMeets ? "at or above" : "below"} the ${L} minimum.`;
  return { ...head, difference, stillMeets, explanation: sentences(compare, judgement) };
}
