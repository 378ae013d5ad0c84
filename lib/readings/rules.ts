import type { DropState } from "../drops/states";
import { durationUncertaintyOfMarks } from "../stats/uncertainty";

// A reading's time comes from the clip's own frame timestamps, never from frame number ÷ rate:
// clips can have a variable rate and a first timestamp that is not zero. Pure.

export interface FrameTimes {
  pts: readonly number[];
  timeBase: { num: number; den: number };
}

export type MarkProblem = { ok: false; reason: string };

const seconds = (ticks: number, tb: FrameTimes["timeBase"]) => (ticks * tb.num) / tb.den;

/**
 * The interval a mark on this frame can be wrong by. A dispense or clear frame is the first frame
 * that shows the event, so the event happened after the frame before it was taken: between
 * pts[f − 1] and pts[f]. Frame 0 has no frame before it and takes the interval to the next one.
 */
export function frameInterval(ix: FrameTimes, frame: number): number {
  const n = ix.pts.length;
  if (n < 2) return 0;
  return frame > 0 ? seconds(ix.pts[frame] - ix.pts[frame - 1], ix.timeBase) : seconds(ix.pts[1] - ix.pts[0], ix.timeBase);
}

export interface DropTime {
  ok: true;
  dispensePts: number;
  clearPts: number;
  /** pts(clear) − pts(dispense), in time-base ticks: exact. */
  ticks: number;
  seconds: number;
  uncertainty: { standard: number; expanded: number };
}

/** The time of a drop from its two marked frames, with the frame-quantisation uncertainty (GUM). */
export function dropTime(ix: FrameTimes, dispenseFrame: number, clearFrame: number): DropTime | MarkProblem {
  const n = ix.pts.length;
  for (const [name, f] of [
    ["dispense", dispenseFrame],
    ["clear", clearFrame],
  ] as const) {
    if (!Number.isInteger(f) || f < 0 || f >= n) return { ok: false, reason: `The ${name} frame ${f} is outside the clip, which has frames 0 to ${n - 1}.` };
  }
  if (clearFrame <= dispenseFrame) return { ok: false, reason: `The clear frame (${clearFrame}) must come after the dispense frame (${dispenseFrame}).` };
  const ticks = ix.pts[clearFrame] - ix.pts[dispenseFrame];
  return {
    ok: true,
    dispensePts: ix.pts[dispenseFrame],
    clearPts: ix.pts[clearFrame],
    ticks,
    seconds: seconds(ticks, ix.timeBase),
    uncertainty: durationUncertaintyOfMarks(frameInterval(ix, dispenseFrame), frameInterval(ix, clearFrame)),
  };
}

export interface Agreement {
  agreed: boolean;
  /** b − a on the drop time, and on each mark, in seconds. */
  timeDifferenceS: number;
  dispenseDifferenceS: number;
  clearDifferenceS: number;
  /** The mean of the two times when they agree. */
  agreedValueS: number | null;
}

/** Two readings agree when the drop times and each mark differ by no more than the tolerance. */
export function compareReadings(
  a: { dispensePts: number; clearPts: number },
  b: { dispensePts: number; clearPts: number },
  timeBase: FrameTimes["timeBase"],
  toleranceS: number,
): Agreement {
  const time = (r: typeof a) => seconds(r.clearPts - r.dispensePts, timeBase);
  const timeDifferenceS = time(b) - time(a);
  const dispenseDifferenceS = seconds(b.dispensePts - a.dispensePts, timeBase);
  const clearDifferenceS = seconds(b.clearPts - a.clearPts, timeBase);
  // A hair of slack keeps a difference of exactly the tolerance from failing on binary rounding.
  const within = (d: number) => Math.abs(d) <= toleranceS + 1e-9;
  const agreed = within(timeDifferenceS) && within(dispenseDifferenceS) && within(clearDifferenceS);
  return { agreed, timeDifferenceS, dispenseDifferenceS, clearDifferenceS, agreedValueS: agreed ? (time(a) + time(b)) / 2 : null };
}

export interface ChainReading {
  id: string;
  slot: number;
  status: "draft" | "submitted";
  supersedesId: string | null;
  dispensePts: number | null;
  clearPts: number | null;
}

/** The reading that counts in each slot: the latest submitted one of its chain of corrections. */
export function currentReadings<R extends ChainReading>(readings: readonly R[]): R[] {
  const submitted = readings.filter((r) => r.status === "submitted");
  const replaced = new Set(submitted.map((r) => r.supersedesId).filter((id): id is string => id !== null));
  return submitted.filter((r) => !replaced.has(r.id)).sort((a, b) => a.slot - b.slot);
}

/**
 * The same rule on readings as the views send them (each already says whether a correction replaced
 * it): the submitted readings that count, in slot order. Used by the pages that show a drop.
 */
export function countingReadings<R extends { status: string; superseded: boolean; slot?: number | null }>(readings: readonly R[]): R[] {
  return readings.filter((r) => r.status === "submitted" && !r.superseded).sort((a, b) => (a.slot ?? 0) - (b.slot ?? 0));
}

/** The ids of submitted readings that a later submitted correction replaced. */
export function supersededIds(readings: readonly ChainReading[]): Set<string> {
  return new Set(readings.filter((r) => r.status === "submitted" && r.supersedesId).map((r) => r.supersedesId!));
}

export interface DropOutcome {
  state: Extract<DropState, "unread" | "read once" | "agreed" | "discrepancy">;
  agreement: Agreement | null;
}

/** A drop's state from its readings: none, one, or two that agree or not within the tolerance. */
export function dropOutcome(readings: readonly ChainReading[], timeBase: FrameTimes["timeBase"], toleranceS: number): DropOutcome {
  const current = currentReadings(readings);
  if (current.length === 0) return { state: "unread", agreement: null };
  if (current.length === 1) return { state: "read once", agreement: null };
  const [a, b] = current.map((r) => ({ dispensePts: r.dispensePts!, clearPts: r.clearPts! }));
  const agreement = compareReadings(a, b, timeBase, toleranceS);
  return { state: agreement.agreed ? "agreed" : "discrepancy", agreement };
}

export interface Marks {
  dispenseFrame: number | null;
  clearFrame: number | null;
  dispensePts: number | null;
  clearPts: number | null;
  timeS: number | null;
  uncertaintyStandardS: number | null;
  uncertaintyExpandedS: number | null;
}

/** Looks each marked frame up in the index; with both marks, the drop time and its uncertainty. */
export function marksFrom(ix: FrameTimes, dispenseFrame: number | null, clearFrame: number | null): Marks | MarkProblem {
  const n = ix.pts.length;
  for (const [name, f] of [
    ["dispense", dispenseFrame],
    ["clear", clearFrame],
  ] as const) {
    if (f !== null && (!Number.isInteger(f) || f < 0 || f >= n))
      return { ok: false, reason: `The ${name} frame ${f} is outside the clip, which has frames 0 to ${n - 1}.` };
  }
  const none = { timeS: null, uncertaintyStandardS: null, uncertaintyExpandedS: null };
  const pts = (f: number | null) => (f === null ? null : ix.pts[f]);
  if (dispenseFrame === null || clearFrame === null) return { dispenseFrame, clearFrame, dispensePts: pts(dispenseFrame), clearPts: pts(clearFrame), ...none };
  const t = dropTime(ix, dispenseFrame, clearFrame);
  if (!t.ok) return t;
  return {
    dispenseFrame,
    clearFrame,
    dispensePts: t.dispensePts,
    clearPts: t.clearPts,
    timeS: t.seconds,
    uncertaintyStandardS: t.uncertainty.standard,
    uncertaintyExpandedS: t.uncertainty.expanded,
  };
}
