import "server-only";
import type { Actor } from "../auth/actor";
import { recordChange } from "../audit/record";
import { findFrameIndex } from "../frame-index/queries";
import { db, type Db } from "../db";
import { AppError } from "../errors";
import { notifyBelowLimit } from "../notifications/events";
import { findDrop, type DropRow } from "../drops/queries";
import { assertDropUnlocked } from "../signoff/lock";
import { assertCanSeeDrops } from "../readings/policy";
import { listReadingsOfDrop, type ReadingRow } from "../readings/queries";
import { currentReadings, marksFrom, type Marks } from "../readings/rules";
import { assertCanRule, assertNotAParty } from "./policy";
import { findRulingOfDrop, insertRuling, insertThirdReading, setRuled } from "./queries";
import type { RulingInput } from "./schema";
import { toRulingView, type RulingView } from "./view";

// A lead's ruling on a drop whose two readings disagree: accept one, or read it a third time, with
// a reason. The ruled value becomes the drop's time; the two readings are never touched.

const NO_DROP = "No such drop.";

async function thirdMarks(q: Db, drop: DropRow, input: RulingInput): Promise<Marks & { timeS: number }> {
  if (drop.clipStatus !== "ready" || !drop.clipId) throw new AppError("conflict", "The clip of this drop is not ready, so no third reading can be made on it.");
  const index = await findFrameIndex(q, drop.clipId);
  if (!index) throw new AppError("conflict", "The clip of this drop has no frame index yet.");
  const m = marksFrom(index, input.dispenseFrame!, input.clearFrame!);
  if ("ok" in m) throw new AppError("validation", m.reason);
  if (m.timeS === null) throw new AppError("validation", "Mark both the dispense frame and the clear frame of the third reading.");
  return { ...m, timeS: m.timeS };
}

function pick(current: ReadingRow[], slot: 1 | 2): ReadingRow {
  const r = current.find((x) => x.slot === slot);
  if (!r || r.timeS === null) throw new AppError("conflict", "This drop does not have two submitted readings to choose from.");
  return r;
}

export async function ruleDrop(actor: Actor, dropId: string, input: RulingInput): Promise<RulingView> {
  assertCanSeeDrops(actor);
  assertCanRule(actor);
  return db().transaction(async (trx) => {
    // The submission before the drop: the order sign-off takes them in.
    await assertDropUnlocked(trx, { dropId });
    const drop = await findDrop(trx, dropId, { lock: true });
    if (!drop) throw new AppError("not_found", NO_DROP);
    const existing = await findRulingOfDrop(trx, dropId);
    if (existing)
      throw new AppError(
        "conflict",
        `This drop was already ruled by ${existing.ruledByName} on ${existing.ruledAt.toISOString().slice(0, 10)}; a ruling stands once made.`,
      );
    if (drop.state !== "discrepancy") throw new AppError("conflict", `Only a drop whose readings disagree can be ruled; this one is ${drop.state}.`);
    const readings = await listReadingsOfDrop(trx, dropId);
    const current = currentReadings(readings).filter((r) => r.slot <= 2);
    assertNotAParty(
      actor,
      readings.map((r) => r.reviewerId),
    );
    let readingId: string;
    let timeS: number;
    let third: (Marks & { timeS: number }) | null = null;
    if (input.chosen === "third") {
      third = await thirdMarks(trx, drop, input);
      readingId = await insertThirdReading(trx, { dropId, clipId: drop.clipId!, reviewerId: actor.id, ...third });
      timeS = third.timeS;
    } else {
      const r = pick(current, input.chosen === "first" ? 1 : 2);
      readingId = r.id;
      timeS = r.timeS!;
    }
    const { id } = await insertRuling(trx, { dropId, chosen: input.chosen, readingId, timeS, reason: input.reason, ruledBy: actor.id });
    await setRuled(trx, dropId, timeS);
    // A ruled drop has settled: it may complete a ball that is below the limit.
    await notifyBelowLimit(trx, drop);
    const after = {
      dropId,
      chosen: input.chosen,
      readingId,
      timeS,
      reason: input.reason,
      ...(third ? { dispenseFrame: third.dispenseFrame, clearFrame: third.clearFrame } : {}),
    };
    await recordChange(trx, actor, { action: "ruling.made", entity: "ruling", entityId: id, after });
    await recordChange(trx, actor, {
      action: "drop.state_changed",
      entity: "drop",
      entityId: dropId,
      before: { state: drop.state, agreedTimeS: drop.agreedTimeS },
      after: { state: "ruled", agreedTimeS: timeS },
    });
    return toRulingView((await findRulingOfDrop(trx, dropId))!);
  });
}

/** The ruling on a drop, or null while none is made. */
export async function getRuling(actor: Actor, dropId: string): Promise<RulingView | null> {
  assertCanSeeDrops(actor);
  const drop = await findDrop(db(), dropId);
  if (!drop) throw new AppError("not_found", NO_DROP);
  const r = await findRulingOfDrop(db(), dropId);
  return r ? toRulingView(r) : null;
}
