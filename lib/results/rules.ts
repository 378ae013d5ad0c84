import type { EditionValues } from "../editions/schema";
import { dixonQ } from "../stats";
import { meanAndSd } from "../stats/sample";
import { judgeSubmission, type SubmissionDecision } from "./decision";

// Drop, ball and submission results from settled drop times. Pure: the same inputs always give
// the same decision, so a decision can be recomputed and checked at any time.

/** Confidence of Dixon's Q flag on a ball's drops. An example default: the lab's procedure decides. */
export const DIXON_CONFIDENCE = 0.95;

/** The edition's values a result is judged by. */
export type ResultLimits = Pick<
  EditionValues,
  "minAbsorptionS" | "criterion" | "belowMinimumRule" | "dropsPerBall" | "guardBandS" | "roundSizes" | "toleranceCoverage" | "toleranceConfidence"
>;

export interface DropInput {
  id: string;
  ordinal: number;
  /** Agreed or ruled: its time counts. */
  settled: boolean;
  timeS: number | null;
  /** Expanded (k = 2) frame-quantisation uncertainty of the drop time. */
  uncertaintyS: number | null;
  readers: string[];
}

export interface BallInput {
  sampleId: string;
  serial: string;
  round: number;
  weightG: number;
  /** The run that counts for this ball (its latest), or null before the ball is tested. */
  run: { id: string; needsAcceptance: boolean } | null;
  drops: DropInput[];
}

export type BallStatus = "meets" | "close" | "below" | "pending";

export interface BallResult {
  sampleId: string;
  serial: string;
  round: number;
  weightG: number;
  runId: string | null;
  drops: (DropInput & { outlier: boolean })[];
  n: number;
  mean: number | null;
  sd: number | null;
  min: number | null;
  max: number | null;
  range: number | null;
  /** What the criterion judges: the ball mean, or its shortest drop for "every drop". */
  value: number | null;
  status: BallStatus;
  pendingReason: string | null;
  /** Dixon's Q on the ball's drops: the drop is flagged, never removed; the lab decides. */
  dixon: { q: number; critical: number; confidence: number; outlierDropId: string | null } | null;
}

export interface ResultSet {
  limits: ResultLimits;
  balls: BallResult[];
  decision: SubmissionDecision;
}

function pendingReason(b: BallInput): string | null {
  if (!b.run) return "not tested yet";
  if (b.run.needsAcceptance) return "its run's conditions wait for a lead to accept them";
  if (b.drops.length === 0) return "its run has no drops";
  const settled = b.drops.filter((d) => d.settled && d.timeS !== null).length;
  if (settled < b.drops.length) return `${settled} of ${b.drops.length} drops settled`;
  return null;
}

function dixonOf(drops: DropInput[]): BallResult["dixon"] {
  const times = drops.map((d) => d.timeS as number);
  if (times.length < 3 || times.length > 10 || Math.max(...times) === Math.min(...times)) return null;
  const r = dixonQ(times, DIXON_CONFIDENCE);
  const suspect = drops.find((d) => d.timeS === r.suspect);
  return { q: r.q, critical: r.critical, confidence: DIXON_CONFIDENCE, outlierDropId: r.isOutlier && suspect ? suspect.id : null };
}

/** Where a judged value sits: below the minimum, inside the guard band above it, or clear. */
export function statusOf(value: number, limits: Pick<ResultLimits, "minAbsorptionS" | "guardBandS">): Exclude<BallStatus, "pending"> {
  if (value < limits.minAbsorptionS) return "below";
  if (value < limits.minAbsorptionS + limits.guardBandS) return "close";
  return "meets";
}

/** One ball: n, mean, SD, range, the Dixon flag, and meets / close / below by the edition's criterion. */
export function ballResult(b: BallInput, limits: ResultLimits): BallResult {
  const base = { sampleId: b.sampleId, serial: b.serial, round: b.round, weightG: b.weightG, runId: b.run?.id ?? null };
  const reason = pendingReason(b);
  const drops = [...b.drops].sort((x, y) => x.ordinal - y.ordinal);
  if (reason) {
    const none = { n: 0, mean: null, sd: null, min: null, max: null, range: null, value: null, dixon: null };
    return { ...base, ...none, drops: drops.map((d) => ({ ...d, outlier: false })), status: "pending", pendingReason: reason };
  }
  const times = drops.map((d) => d.timeS as number);
  const n = times.length;
  const { mean, sd } = n > 1 ? meanAndSd(times) : { mean: times[0], sd: null };
  const min = Math.min(...times);
  const max = Math.max(...times);
  const value = limits.criterion === "every_drop" ? min : mean;
  const dixon = dixonOf(drops);
  return {
    ...base,
    drops: drops.map((d) => ({ ...d, outlier: d.id === dixon?.outlierDropId })),
    n,
    mean,
    sd,
    min,
    max,
    range: max - min,
    value,
    status: statusOf(value, limits),
    pendingReason: null,
    dixon,
  };
}

/** Every ball of the submission and the staged decision after its current round. */
export function submissionResults(limits: ResultLimits, balls: BallInput[], currentRound: number): ResultSet {
  const results = balls.map((b) => ballResult(b, limits)).sort((a, b) => a.round - b.round || a.serial.localeCompare(b.serial, "en", { numeric: true }));
  return { limits, balls: results, decision: judgeSubmission(limits, results, currentRound) };
}
