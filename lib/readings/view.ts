import type { Actor } from "../auth/actor";
import type { DropRow } from "../drops/queries";
import { canSeeReading, isBlindFor } from "./policy";
import type { ReadingRow } from "./queries";
import { currentReadings, supersededIds } from "./rules";
import type { DropState } from "../drops/states";

// What one person sees of a drop and its readings. Every response that carries drops or readings
// is built here, so the blind rule has one home.

export interface ReadingView {
  id: string;
  dropId: string;
  clipId: string;
  reviewerId: string;
  reviewerName: string;
  /** 1 or 2; hidden (null) from a blind reader, since "second" would say that a first exists. */
  slot: number | null;
  status: "draft" | "submitted";
  superseded: boolean;
  dispenseFrame: number | null;
  clearFrame: number | null;
  dispensePts: number | null;
  clearPts: number | null;
  timeS: number | null;
  uncertainty: { standard: number; expanded: number } | null;
  supersedesId: string | null;
  correctionReason: string | null;
  createdAt: string;
  submittedAt: string | null;
}

export interface DropView {
  id: string;
  runId: string;
  ordinal: number;
  sampleId: string;
  sampleSerial: string;
  submissionId: string;
  submissionReference: string;
  clip: { id: string; name: string; status: string; rejectReason: string | null } | null;
  startFrame: number | null;
  placedAt: string | null;
  placedByName: string | null;
  readingToleranceS: number;
  /** True while the viewer may see only their own reading. */
  blind: boolean;
  /** Hidden (null) from a blind reader. */
  state: DropState | null;
  /** When the state last changed (hidden from a blind reader). */
  stateChangedAt: string | null;
  comparison: { agreedTimeS: number | null; timeDifferenceS: number; dispenseDifferenceS: number; clearDifferenceS: number } | null;
  readings: ReadingView[];
  /** The viewer's own unfinished reading, if any. */
  myDraft: ReadingView | null;
  /** The viewer's own reading that counts, if submitted. */
  mySubmitted: ReadingView | null;
}

/** One line of a reviewer's queue. */
export interface QueueItem {
  dropId: string;
  ordinal: number;
  runId: string;
  sampleSerial: string;
  submissionId: string;
  submissionReference: string;
  clipName: string;
  startFrame: number;
  placedAt: string;
  /** The caller's own progress only: nothing about anyone else's reading. */
  mine: "not started" | "draft" | "correction";
}

export function toReadingView(r: ReadingRow, supersededSet: Set<string>, blind: boolean): ReadingView {
  return {
    id: r.id,
    dropId: r.dropId,
    clipId: r.clipId,
    reviewerId: r.reviewerId,
    reviewerName: r.reviewerName,
    slot: blind ? null : r.slot,
    status: r.status,
    superseded: supersededSet.has(r.id),
    dispenseFrame: r.dispenseFrame,
    clearFrame: r.clearFrame,
    dispensePts: r.dispensePts,
    clearPts: r.clearPts,
    timeS: r.timeS,
    uncertainty: r.uncertaintyStandardS === null ? null : { standard: r.uncertaintyStandardS, expanded: r.uncertaintyExpandedS! },
    supersedesId: r.supersedesId,
    correctionReason: r.correctionReason,
    createdAt: r.createdAt.toISOString(),
    submittedAt: r.submittedAt?.toISOString() ?? null,
  };
}

export function toDropView(actor: Actor, d: DropRow, readings: readonly ReadingRow[]): DropView {
  const blind = isBlindFor(actor, currentReadings(readings).length);
  const superseded = supersededIds(readings);
  const visible = readings.filter((r) => canSeeReading(actor, r, blind)).map((r) => toReadingView(r, superseded, blind));
  const mine = visible.filter((r) => r.reviewerId === actor.id);
  const settled = d.timeDifferenceS !== null && !blind;
  return {
    id: d.id,
    runId: d.runId,
    ordinal: d.ordinal,
    sampleId: d.sampleId,
    sampleSerial: d.sampleSerial,
    submissionId: d.submissionId,
    submissionReference: d.submissionReference,
    clip: d.clipId ? { id: d.clipId, name: d.clipName!, status: d.clipStatus!, rejectReason: d.clipRejectReason } : null,
    startFrame: d.startFrame,
    placedAt: d.placedAt?.toISOString() ?? null,
    placedByName: d.placedByName,
    readingToleranceS: d.readingToleranceS,
    blind,
    state: blind ? null : d.state,
    stateChangedAt: blind ? null : (d.stateChangedAt?.toISOString() ?? null),
    comparison: settled
      ? { agreedTimeS: d.agreedTimeS, timeDifferenceS: d.timeDifferenceS!, dispenseDifferenceS: d.dispenseDifferenceS!, clearDifferenceS: d.clearDifferenceS! }
      : null,
    readings: visible,
    myDraft: mine.find((r) => r.status === "draft") ?? null,
    mySubmitted: mine.find((r) => r.status === "submitted" && !r.superseded) ?? null,
  };
}
