import "server-only";
import type { Actor } from "../auth/actor";
import { recordChange } from "../audit/record";
import { findFrameIndexSummary } from "../frame-index/queries";
import { findClip } from "../clips/queries";
import { db } from "../db";
import { AppError } from "../errors";
import { findRun } from "../runs/queries";
import { assertDropUnlocked } from "../signoff/lock";
import { assertLead } from "../submissions/policy";
import { findDrop, listDiscrepancies, listDropsOfRun, listQueueFor, updatePlacement, type DropRow } from "./queries";
import { assertCanPlaceDrops, assertCanSeeDrops, assertReviewer, isReviewer } from "../readings/policy";
import { countReadingsOfDrop, listReadingsOfDrop, listReadingsOfDrops } from "../readings/queries";
import type { PlacementInput } from "../readings/schema";
import { toDropView, type DropView, type QueueItem } from "../readings/view";

// Drops as the lab handles them: placed on a clip by a technician, queued for reviewers, and
// settled or sent to the leads.

export async function getDrop(actor: Actor, id: string): Promise<DropView> {
  assertCanSeeDrops(actor);
  const drop = await findDrop(db(), id);
  if (!drop) throw new AppError("not_found", "No such drop.");
  return toDropView(actor, drop, await listReadingsOfDrop(db(), id));
}

async function viewsOf(actor: Actor, drops: DropRow[]): Promise<DropView[]> {
  const readings = await listReadingsOfDrops(
    db(),
    drops.map((d) => d.id),
  );
  return drops.map((d) =>
    toDropView(
      actor,
      d,
      readings.filter((r) => r.dropId === d.id),
    ),
  );
}

export async function listRunDrops(actor: Actor, runId: string): Promise<DropView[]> {
  assertCanSeeDrops(actor);
  if (!(await findRun(db(), runId))) throw new AppError("not_found", "No such run.");
  return viewsOf(actor, await listDropsOfRun(db(), runId));
}

/** Puts a drop on one of its run's ready clips, near its dispense; refused once reading has begun. */
export async function placeDrop(actor: Actor, id: string, p: PlacementInput): Promise<DropView> {
  assertCanSeeDrops(actor);
  assertCanPlaceDrops(actor);
  await db().transaction(async (trx) => {
    await assertDropUnlocked(trx, { dropId: id });
    const drop = await findDrop(trx, id, { lock: true });
    if (!drop) throw new AppError("not_found", "No such drop.");
    const clip = await findClip(trx, p.clipId);
    if (!clip || clip.runId !== drop.runId)
      throw new AppError("validation", "Choose one of this run's clips.", { fields: { clipId: "Choose one of this run's clips." } });
    if (clip.status !== "ready")
      throw new AppError("validation", `The clip ${clip.originalName} is not ready for reading (${clip.status}).`, {
        fields: { clipId: "This clip is not ready." },
      });
    const index = (await findFrameIndexSummary(trx, clip.id))!;
    if (p.startFrame >= index.frameCount) {
      const message = `The clip has frames 0 to ${index.frameCount - 1}; frame ${p.startFrame} is past its end.`;
      throw new AppError("validation", message, { fields: { startFrame: message } });
    }
    // A placer who also reads drops is not told whether anyone has started reading: they may place
    // a drop once, and moving it is left to those who do not read.
    if (drop.clipId && isReviewer(actor))
      throw new AppError("conflict", "This drop is already placed. Because you also read drops, a technician or a lead who does not read moves it.");
    if (drop.clipId && (await countReadingsOfDrop(trx, id)) > 0) throw new AppError("conflict", "Reading of this drop has begun, so it stays where it is.");
    await updatePlacement(trx, id, { ...p, placedBy: actor.id });
    await recordChange(trx, actor, {
      action: "drop.placed",
      entity: "drop",
      entityId: id,
      before: { clipId: drop.clipId, startFrame: drop.startFrame },
      after: p,
    });
  });
  return getDrop(actor, id);
}

export async function workQueue(actor: Actor): Promise<QueueItem[]> {
  assertCanSeeDrops(actor);
  assertReviewer(actor, "have a reading queue");
  const views = await viewsOf(actor, await listQueueFor(db(), actor.id));
  return views.map((v) => ({
    dropId: v.id,
    ordinal: v.ordinal,
    runId: v.runId,
    sampleSerial: v.sampleSerial,
    submissionId: v.submissionId,
    submissionReference: v.submissionReference,
    clipName: v.clip!.name,
    startFrame: v.startFrame!,
    placedAt: v.placedAt!,
    mine: v.myDraft ? (v.myDraft.supersedesId ? "correction" : "draft") : "not started",
  }));
}

export async function discrepancyQueue(actor: Actor): Promise<DropView[]> {
  assertCanSeeDrops(actor);
  assertLead(actor, "see the discrepancies");
  return viewsOf(actor, await listDiscrepancies(db()));
}
