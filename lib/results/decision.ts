import { fractionBelow, lowerToleranceLimit } from "../stats";
import type { BallResult, ResultLimits } from "./rules";
import { ballList, everyJudged, judged, judgedThresholds, limitSecs, pct, secs, secsAgainst, sentences } from "./words";

// The staged decision on a submission. After each round: every ball clear of the guard band meets
// the limit; a ball inside the guard band asks for the next round; once every round is in, the
// lower tolerance limit decides. A ball below the minimum is named in every decision, in every
// round, and fails the submission on its own unless the edition says it is only reported.

export const DECISIONS = ["meets limit", "close to limit — more samples", "below limit", "pending"] as const;
export type Decision = (typeof DECISIONS)[number];

export interface ToleranceJudgement {
  n: number;
  mean: number;
  sd: number;
  k: number;
  /** mean − k·s of the balls' judged values. */
  limit: number;
  coverage: number;
  confidence: number;
  /** Estimated fraction of balls below the minimum, Φ((L − mean)/s). */
  fractionBelow: number;
  /** (mean − L)/(3s); null when the values do not vary. */
  cpl: number | null;
  passes: boolean;
}

export interface SubmissionDecision {
  decision: Decision;
  /** The round the decision is about. */
  round: number;
  /** Every planned round is in: the tolerance limit may decide. */
  finalRound: boolean;
  decidedBy: "every ball clear" | "tolerance limit" | "single ball" | "ball below the minimum" | null;
  explanation: string;
  nextAction: string;
  nextRound: { round: number; size: number } | null;
  belowBalls: string[];
  /** The balls below the minimum and what follows from them, in words; empty when there are none. */
  belowNote: string;
  closeBalls: string[];
  pendingBalls: string[];
  /** Shown from two balls on; it decides only once every round is in. */
  tolerance: ToleranceJudgement | null;
}

/** Lower tolerance limit of the balls' judged values against the minimum (exact k, noncentral t). */
export function toleranceJudgement(values: number[], limits: ResultLimits): ToleranceJudgement | null {
  if (values.length < 2) return null;
  const { toleranceCoverage: coverage, toleranceConfidence: confidence, minAbsorptionS: L } = limits;
  // Identical values have no spread: their mean, SD and limit are the common value, 0 and that value
  // exactly. Computed, the mean can land an ulp or two off (with an SD of 1e-16), which would put a
  // ball at the minimum below it, or a ball below the minimum "0 %" below.
  const same = values.every((v) => v === values[0]);
  const computed = lowerToleranceLimit(values, coverage, confidence);
  const t = same ? { ...computed, mean: values[0], sd: 0, limit: values[0] } : computed;
  const spread = t.sd > 0 ? fractionBelow(values, L) : null;
  const fraction = spread ? spread.fraction : t.mean < L ? 1 : t.mean > L ? 0 : 0.5;
  return { n: values.length, ...t, coverage, confidence, fractionBelow: fraction, cpl: spread?.cpl ?? null, passes: t.limit >= L };
}

function roundsExpected(limits: ResultLimits, round: number): number {
  return limits.roundSizes.slice(0, round).reduce((a, b) => a + b, 0);
}

/** Every ball below the minimum, with what follows: it fails the submission, testing goes on, or (last round) the tolerance limit decides. */
function belowSentence(below: BallResult[], limits: ResultLimits, finalRound: boolean): string {
  if (below.length === 0) return "";
  const verb = below.length === 1 ? "is" : "are";
  const what = `${ballList(below, limits)} ${verb} below the ${limitSecs(limits.minAbsorptionS)} minimum`;
  if (limits.belowMinimumRule === "fails") return `${what}: under this edition a ball below the minimum fails the submission on its own.`;
  if (!finalRound) return `${what}: tell the manufacturer now; testing goes on.`;
  return `${what}: the manufacturer is told; under this edition the tolerance limit of every ball decides.`;
}

export function judgeSubmission(limits: ResultLimits, balls: BallResult[], currentRound: number): SubmissionDecision {
  const round = Math.max(1, currentRound, ...balls.map((b) => b.round));
  const finalRound = round >= limits.roundSizes.length;
  const inScope = balls.filter((b) => b.round <= round);
  const pending = inScope.filter((b) => b.status === "pending");
  const below = inScope.filter((b) => b.status === "below");
  const close = inScope.filter((b) => b.status === "close");
  const missing = Math.max(0, roundsExpected(limits, round) - inScope.length);
  const values = inScope.filter((b) => b.value !== null).map((b) => b.value as number);
  // A statistic that cannot be computed must not take the results page, the report or a reading
  // down with it: the decision then waits for a person, and says why.
  let tolerance: ToleranceJudgement | null = null;
  let toleranceProblem = "";
  try {
    tolerance = toleranceJudgement(values, limits);
  } catch (err) {
    toleranceProblem = `The lower tolerance limit of ${values.length} balls could not be computed (${err instanceof Error ? err.message : String(err)}).`;
  }
  const warn = belowSentence(below, limits, finalRound);
  const base = {
    round,
    finalRound,
    tolerance,
    belowBalls: below.map((b) => b.serial),
    belowNote: warn,
    closeBalls: close.map((b) => b.serial),
    pendingBalls: pending.map((b) => b.serial),
  };
  const L = limitSecs(limits.minAbsorptionS);
  const waiting = [
    ...pending.map((b) => `${b.serial} (${b.pendingReason})`),
    ...(missing > 0 ? [`${missing} sample${missing === 1 ? "" : "s"} of round ${round} not received`] : []),
  ];

  if (below.length > 0 && limits.belowMinimumRule === "fails") {
    // The outcome cannot change, whatever the other balls and rounds show.
    return {
      ...base,
      decision: "below limit",
      decidedBy: "ball below the minimum",
      explanation: sentences(`Round ${round}:`, warn, waiting.length ? `Still without a result: ${waiting.join("; ")}.` : ""),
      nextAction: waiting.length
        ? "Report the result to the manufacturer; finish the round's readings, then a lead reviews the results and signs them off."
        : "Report the result to the manufacturer; a lead reviews the results and signs them off.",
      nextRound: null,
    };
  }
  if (pending.length > 0 || missing > 0) {
    return {
      ...base,
      decision: "pending",
      decidedBy: null,
      explanation: sentences(
        `Round ${round}: ${inScope.length - pending.length} of ${inScope.length + missing} balls have results. Waiting: ${waiting.join("; ")}.`,
        warn,
      ),
      nextAction:
        missing > 0
          ? `Receive and test the rest of round ${round}.`
          : `Finish the runs and readings of round ${round}; the decision follows when every ball has a result.`,
      nextRound: null,
    };
  }
  const n = inScope.length;
  const balls_ = `${n} ball${n === 1 ? "" : "s"}`;
  if (below.length === 0 && close.length === 0) {
    const lowest = inScope.reduce((a, b) => ((b.value as number) < (a.value as number) ? b : a));
    return {
      ...base,
      decision: "meets limit",
      decidedBy: "every ball clear",
      explanation: `${balls_}; ${everyJudged(limits)} is at least ${secs(limits.minAbsorptionS + limits.guardBandS)}, clear of the ${L} minimum and its ${limitSecs(limits.guardBandS)} guard band (lowest: ${lowest.serial}, ${secsAgainst(lowest.value as number, judgedThresholds(limits))}).`,
      nextAction: "A lead reviews the results and signs them off.",
      nextRound: null,
    };
  }
  if (!finalRound) {
    const size = limits.roundSizes[round];
    const closeWords = close.length
      ? `${close.length} of ${n} balls ${close.length === 1 ? "is" : "are"} close to the ${L} minimum, inside its ${limitSecs(limits.guardBandS)} guard band: ${ballList(close, limits)}.`
      : "";
    return {
      ...base,
      decision: "close to limit — more samples",
      decidedBy: null,
      explanation: sentences(`After round ${round}:`, closeWords, warn, `Round ${round + 1} asks for ${size} more sample${size === 1 ? "" : "s"}.`),
      nextAction: `Request round ${round + 1}: ${size} more sample${size === 1 ? "" : "s"} from the manufacturer.`,
      nextRound: { round: round + 1, size },
    };
  }
  if (toleranceProblem) {
    return {
      ...base,
      decision: "pending",
      decidedBy: null,
      explanation: sentences(`${balls_}:`, toleranceProblem, warn),
      nextAction: "A lead judges the results by the lab's procedure; tell the Wickmark maintainers what the page says.",
      nextRound: null,
    };
  }
  if (!tolerance) {
    const ok = below.length === 0;
    return {
      ...base,
      decision: ok ? "meets limit" : "below limit",
      decidedBy: "single ball",
      explanation: `1 ball (${inScope[0].serial}), so no tolerance limit can be computed; its ${judged(limits)} ${secsAgainst(values[0], judgedThresholds(limits))} is ${ok ? "at or above" : "below"} the ${L} minimum.`,
      nextAction: ok
        ? "A lead reviews the results and signs them off."
        : "Report the result to the manufacturer; a lead reviews the results and signs them off.",
      nextRound: null,
    };
  }
  const level = `${pct(tolerance.coverage)}/${pct(tolerance.confidence)}`;
  const fraction = `estimated fraction of balls below the minimum ${pct(tolerance.fractionBelow, 2)}`;
  return {
    ...base,
    decision: tolerance.passes ? "meets limit" : "below limit",
    decidedBy: "tolerance limit",
    explanation: sentences(
      `${balls_}; lower ${level} tolerance limit ${secsAgainst(tolerance.limit, limits.minAbsorptionS)} is ${tolerance.passes ? "at or above" : "below"} the ${L} minimum; ${fraction}.`,
      warn,
    ),
    nextAction: tolerance.passes
      ? "A lead reviews the results and signs them off."
      : "Report the result to the manufacturer; a lead reviews the results and signs them off.",
    nextRound: null,
  };
}
