import "server-only";
import { isBeingRead } from "../drops/states";
import type { Actor } from "../auth/actor";
import { recordChange } from "../audit/record";
import { findFrameIndex } from "../frame-index/queries";
import { notifyBelowLimit, notifyDiscrepancy } from "../notifications/events";
import { db, type Db } from "../db";
import { AppError } from "../errors";
import { assertDropUnlocked } from "../signoff/lock";
import { findDrop, findDropOfReadingForUpdate, updateDropOutcome, type DropRow } from "../drops/queries";
import { assertCanSeeDrops, assertReviewer, canSeeReading, isBlindFor } from "./policy";
import { deleteDraft, findReading, insertReading, listReadingsOfDrop, markSubmitted, updateDraftMarks, type ReadingRow } from "./queries";
import { currentReadings, dropOutcome, marksFrom, supersededIds, type Marks } from "./rules";
import type { MarksInput } from "./schema";
import { toDropView, toReadingView, type DropView, type ReadingView } from "./view";

// A reviewer's reading of a drop: started as a draft, marked frame by frame, submitted once and for
// all. Every change locks the drop first, so two readers finishing at once still settle it once.

const NO_READING = "No such reading.";

async function lockedDrop(actor: Actor, q: Db, dropId: string): Promise<DropRow> {
  assertCanSeeDrops(actor);
  const drop = await findDrop(q, dropId, { lock: true });
  if (!drop) throw new AppError("not_found", "No such drop.");
  return drop;
}

/** The clip must still be fit to read: the drop's own clip, and ready. */
function assertReadable(drop: DropRow, clipId: string): void {
  if (drop.clipStatus === "rejected" && drop.clipId === clipId)
    throw new AppError("conflict", `The clip was rejected (${drop.clipRejectReason ?? "no reason recorded"}); no marks can be made on it.`);
  if (drop.clipStatus !== "ready" || drop.clipId !== clipId || !drop.timeBase)
    throw new AppError("conflict", "The clip of this drop is not ready for reading.");
}

/** Looks the marks up in the clip's frame index, once the clip is known to be fit to read. */
async function lookUpMarks(q: Db, drop: DropRow, clipId: string, dispenseFrame: number | null, clearFrame: number | null): Promise<Marks> {
  assertReadable(drop, clipId);
  const index = await findFrameIndex(q, clipId);
  if (!index) throw new AppError("conflict", "The clip of this drop has no frame index yet.");
  const m = marksFrom(index, dispenseFrame, clearFrame);
  if ("ok" in m) throw new AppError("validation", m.reason);
  return m;
}

async function dropViewFor(actor: Actor, q: Db, dropId: string): Promise<DropView> {
  const drop = (await findDrop(q, dropId))!;
  return toDropView(actor, drop, await listReadingsOfDrop(q, dropId));
}

/** Starts the caller's reading of a drop (or returns the draft already started), with any marks. */
export async function startReading(actor: Actor, dropId: string, marks: MarksInput = {}): Promise<DropView> {
  assertReviewer(actor, "read drops");
  return db().transaction(async (trx) => {
    // The submission before the drop: the order sign-off takes them in.
    await assertDropUnlocked(trx, { dropId });
    const drop = await lockedDrop(actor, trx, dropId);
    if (!drop.clipId) throw new AppError("conflict", "This drop is not placed on a clip yet: a technician places it first.");
    const readings = await listReadingsOfDrop(trx, dropId);
    const mine = readings.filter((r) => r.reviewerId === actor.id);
    const draft = mine.find((r) => r.status === "draft");
    if (draft) {
      if (marks.dispenseFrame !== undefined || marks.clearFrame !== undefined) await applyMarks(trx, drop, draft, marks);
      return dropViewFor(actor, trx, dropId);
    }
    if (mine.length)
      throw new AppError(
        "conflict",
        "You have already read this drop. The other reading must come from another reviewer; to fix your own, record a correction.",
      );
    const heads = readings.filter((r) => r.supersedesId === null);
    if (heads.length >= 2 || !isBeingRead(drop.state)) throw new AppError("conflict", "This drop already has its two readers.");
    const m = await lookUpMarks(trx, drop, drop.clipId, marks.dispenseFrame ?? null, marks.clearFrame ?? null);
    const slot = heads.some((r) => r.slot === 1) ? 2 : 1;
    const { id } = await insertReading(trx, { dropId, clipId: drop.clipId, reviewerId: actor.id, slot, supersedesId: null, correctionReason: null, ...m });
    await recordChange(trx, actor, { action: "reading.started", entity: "reading", entityId: id, after: { dropId, slot } });
    return dropViewFor(actor, trx, dropId);
  });
}

/** Only the author touches a reading before both are in; to anyone else it does not exist. */
async function ownReading(actor: Actor, q: Db, id: string): Promise<ReadingRow> {
  assertCanSeeDrops(actor);
  const r = await findReading(q, id);
  if (!r || r.reviewerId !== actor.id) throw new AppError("not_found", NO_READING);
  return r;
}

async function applyMarks(q: Db, drop: DropRow, draft: ReadingRow, marks: MarksInput): Promise<void> {
  const dispense = marks.dispenseFrame === undefined ? draft.dispenseFrame : marks.dispenseFrame;
  const clear = marks.clearFrame === undefined ? draft.clearFrame : marks.clearFrame;
  await updateDraftMarks(q, draft.id, await lookUpMarks(q, drop, draft.clipId, dispense, clear));
}

export async function saveMarks(actor: Actor, id: string, marks: MarksInput): Promise<DropView> {
  return db().transaction(async (trx) => {
    const r = await ownReading(actor, trx, id);
    const drop = await lockedDrop(actor, trx, r.dropId);
    if (r.status !== "draft") throw new AppError("conflict", "This reading is submitted and cannot change. Record a correction instead.");
    await applyMarks(trx, drop, r, marks);
    return dropViewFor(actor, trx, r.dropId);
  });
}

const BOTH_IN = "Both readings of this drop are in: it can no longer be corrected by a reader. A lead settles any disagreement by a ruling.";

/**
 * Submits the caller's draft. The hot path of reading: one locked read of the drop, one of its
 * readings, one update, the audit record, and the drop's state only when it changes.
 */
export async function submitReading(actor: Actor, id: string): Promise<DropView> {
  assertCanSeeDrops(actor);
  return db().transaction(async (trx) => {
    await assertDropUnlocked(trx, { readingId: id });
    const drop = await findDropOfReadingForUpdate(trx, id);
    const readings = drop ? await listReadingsOfDrop(trx, drop.id) : [];
    const r = readings.find((x) => x.id === id);
    if (!drop || !r || r.reviewerId !== actor.id) throw new AppError("not_found", NO_READING);
    if (r.status !== "draft") throw new AppError("conflict", "This reading is already submitted.");
    if (r.dispenseFrame === null || r.clearFrame === null)
      throw new AppError("validation", "Mark both the dispense frame and the clear frame before submitting.");
    assertReadable(drop, r.clipId);
    if (r.supersedesId && currentReadings(readings).length >= 2) throw new AppError("conflict", BOTH_IN);
    // The marks were looked up in the frame index when they were saved, and an index never changes.
    const submittedAt = await markSubmitted(trx, id);
    const after = readings.map((x) => (x.id === id ? { ...x, status: "submitted" as const, submittedAt } : x));
    const o = dropOutcome(after, drop.timeBase!, drop.readingToleranceS);
    const a = o.agreement;
    const outcome = {
      state: o.state,
      agreedTimeS: a?.agreedValueS ?? null,
      timeDifferenceS: a?.timeDifferenceS ?? null,
      dispenseDifferenceS: a?.dispenseDifferenceS ?? null,
      clearDifferenceS: a?.clearDifferenceS ?? null,
    };
    await recordChange(trx, actor, {
      action: r.supersedesId ? "reading.corrected" : "reading.submitted",
      entity: "reading",
      entityId: id,
      after: { dropId: r.dropId, dispenseFrame: r.dispenseFrame, clearFrame: r.clearFrame, timeS: r.timeS, supersedes: r.supersedesId },
    });
    if (o.state === drop.state) return toDropView(actor, drop, after);
    await updateDropOutcome(trx, drop.id, outcome);
    await recordChange(trx, actor, {
      action: "drop.state_changed",
      entity: "drop",
      entityId: drop.id,
      before: { state: drop.state },
      after: { state: o.state, agreement: a },
    });
    // Mail in the same transaction: leads for a new discrepancy, the manufacturer for a ball newly below the limit.
    if (o.state === "discrepancy") await notifyDiscrepancy(trx, drop, outcome.timeDifferenceS);
    if (o.state === "agreed") await notifyBelowLimit(trx, drop);
    return toDropView(actor, { ...drop, ...outcome }, after);
  });
}

/** A correction is a new draft that will replace the caller's submitted reading; the old one stays. */
export async function correctReading(actor: Actor, id: string, reason: string): Promise<DropView> {
  assertReviewer(actor, "correct readings");
  return db().transaction(async (trx) => {
    await assertDropUnlocked(trx, { readingId: id });
    const drop = await findDropOfReadingForUpdate(trx, id);
    const readings = drop ? await listReadingsOfDrop(trx, drop.id) : [];
    const r = readings.find((x) => x.id === id);
    if (!drop || !r || r.reviewerId !== actor.id) throw new AppError("not_found", NO_READING);
    const current = currentReadings(readings);
    if (r.status !== "submitted") throw new AppError("conflict", "This reading is still a draft: change its marks directly.");
    if (current.length >= 2) throw new AppError("conflict", BOTH_IN);
    if (!current.some((c) => c.id === r.id)) throw new AppError("conflict", "This reading was already replaced by a correction.");
    if (readings.some((x) => x.reviewerId === actor.id && x.status === "draft"))
      throw new AppError("conflict", "You already have an unfinished reading of this drop: finish or discard it first.");
    assertReadable(drop, r.clipId);
    // The draft starts from the submitted marks, already looked up in the frame index.
    const { dispenseFrame, clearFrame, dispensePts, clearPts, timeS, uncertaintyStandardS, uncertaintyExpandedS } = r;
    const marks = { dispenseFrame, clearFrame, dispensePts, clearPts, timeS, uncertaintyStandardS, uncertaintyExpandedS };
    const draft = await insertReading(
      trx,
      { dropId: r.dropId, clipId: r.clipId, reviewerId: actor.id, slot: r.slot, supersedesId: r.id, correctionReason: reason, ...marks },
      actor.name,
    );
    await recordChange(trx, actor, { action: "reading.correction_started", entity: "reading", entityId: draft.id, after: { supersedes: r.id, reason } });
    return toDropView(actor, drop, [...readings, draft]);
  });
}

export async function discardDraft(actor: Actor, id: string): Promise<DropView> {
  return db().transaction(async (trx) => {
    const r = await ownReading(actor, trx, id);
    await lockedDrop(actor, trx, r.dropId);
    if (r.status !== "draft") throw new AppError("conflict", "A submitted reading is kept for good; record a correction instead.");
    await deleteDraft(trx, id);
    await recordChange(trx, actor, {
      action: "reading.discarded",
      entity: "reading",
      entityId: id,
      before: { dropId: r.dropId, dispenseFrame: r.dispenseFrame, clearFrame: r.clearFrame },
    });
    return dropViewFor(actor, trx, r.dropId);
  });
}

export async function getReading(actor: Actor, id: string): Promise<ReadingView> {
  assertCanSeeDrops(actor);
  const q = db();
  const r = await findReading(q, id);
  if (!r) throw new AppError("not_found", NO_READING);
  const all = await listReadingsOfDrop(q, r.dropId);
  const blind = isBlindFor(actor, currentReadings(all).length);
  if (!canSeeReading(actor, r, blind)) throw new AppError("not_found", NO_READING);
  return toReadingView(r, supersededIds(all), blind);
}
