import "server-only";
import type { Db } from "../db";
import { BEING_READ_STATES, type DropState, SETTLED_STATES } from "./states";

export interface DropRow {
  id: string;
  runId: string;
  ordinal: number;
  clipId: string | null;
  startFrame: number | null;
  placedBy: string | null;
  placedByName: string | null;
  placedAt: Date | null;
  state: DropState;
  stateChangedAt: Date | null;
  agreedTimeS: number | null;
  timeDifferenceS: number | null;
  dispenseDifferenceS: number | null;
  clearDifferenceS: number | null;
  // Context: the clip it sits on, the sample and submission, and the edition's tolerance.
  clipName: string | null;
  clipStatus: string | null;
  clipRejectReason: string | null;
  sampleId: string;
  sampleSerial: string;
  submissionId: string;
  submissionReference: string;
  organisationId: string;
  readingToleranceS: number;
  /** The clip's time base, once it has a frame index. */
  timeBase: { num: number; den: number } | null;
}

function toDrop(r: Record<string, any>): DropRow {
  return {
    id: r.id,
    runId: r.run_id,
    ordinal: r.ordinal,
    clipId: r.clip_id,
    startFrame: r.start_frame,
    placedBy: r.placed_by,
    placedByName: r.placed_by_name,
    placedAt: r.placed_at,
    state: r.state,
    stateChangedAt: r.state_changed_at,
    agreedTimeS: r.agreed_time_s,
    timeDifferenceS: r.time_difference_s,
    dispenseDifferenceS: r.dispense_difference_s,
    clearDifferenceS: r.clear_difference_s,
    clipName: r.clip_name,
    clipStatus: r.clip_status,
    clipRejectReason: r.clip_reject_reason,
    sampleId: r.sample_id,
    sampleSerial: r.sample_serial,
    submissionId: r.submission_id,
    submissionReference: r.submission_reference,
    organisationId: r.organisation_id,
    readingToleranceS: r.reading_tolerance_s,
    timeBase: r.time_base_den ? { num: Number(r.time_base_num), den: Number(r.time_base_den) } : null,
  };
}

const base = (q: Db) =>
  q("drops as d")
    .join("runs as r", "r.id", "d.run_id")
    .join("samples as s", "s.id", "r.sample_id")
    .join("submissions as sub", "sub.id", "s.submission_id")
    .join("specification_editions as e", "e.id", "sub.edition_id")
    .leftJoin("clips as c", "c.id", "d.clip_id")
    .leftJoin("users as p", "p.id", "d.placed_by")
    .leftJoin("frame_indexes as fi", "fi.clip_id", "d.clip_id")
    .select(
      "d.*",
      "c.original_name as clip_name",
      "c.status as clip_status",
      "c.reject_reason as clip_reject_reason",
      "s.id as sample_id",
      "s.serial as sample_serial",
      "sub.id as submission_id",
      "sub.reference as submission_reference",
      "sub.organisation_id",
      "e.reading_tolerance_s",
      "p.name as placed_by_name",
      "fi.time_base_num",
      "fi.time_base_den",
    );

// Every change to a drop's readings locks the drop row first (only that row: `for update of d`).
export async function findDrop(q: Db, id: string, opts: { lock?: boolean } = {}): Promise<DropRow | undefined> {
  const query = base(q).where("d.id", id).first();
  if (opts.lock) query.forUpdate("d");
  const r = await query;
  return r ? toDrop(r) : undefined;
}

/** The drop a reading belongs to, locked, in one round trip. */
export async function findDropOfReadingForUpdate(q: Db, readingId: string): Promise<DropRow | undefined> {
  const r = await base(q).whereRaw("d.id = (select drop_id from readings where id = ?)", [readingId]).first().forUpdate("d");
  return r ? toDrop(r) : undefined;
}

export async function listDropsOfRun(q: Db, runId: string): Promise<DropRow[]> {
  return (await base(q).where("d.run_id", runId).orderBy("d.ordinal")).map(toDrop);
}

export async function updatePlacement(q: Db, id: string, p: { clipId: string; startFrame: number; placedBy: string }): Promise<void> {
  await q("drops").where({ id }).update({ clip_id: p.clipId, start_frame: p.startFrame, placed_by: p.placedBy, placed_at: q.fn.now() });
}

export async function updateDropOutcome(
  q: Db,
  id: string,
  o: { state: DropState; agreedTimeS: number | null; timeDifferenceS: number | null; dispenseDifferenceS: number | null; clearDifferenceS: number | null },
): Promise<void> {
  await q("drops").where({ id }).update({
    state: o.state,
    state_changed_at: q.fn.now(),
    agreed_time_s: o.agreedTimeS,
    time_difference_s: o.timeDifferenceS,
    dispense_difference_s: o.dispenseDifferenceS,
    clear_difference_s: o.clearDifferenceS,
  });
}

/**
 * Drops waiting for one reviewer: placed on a ready clip, not yet settled, and either holding the
 * reviewer's unfinished reading or still short of two readers none of whom is this reviewer. A
 * voided run's drops no longer count, so nobody is asked to read them.
 */
export async function listQueueFor(q: Db, reviewerId: string, limit = 200): Promise<DropRow[]> {
  const rows = await base(q)
    .where("c.status", "ready")
    .whereNull("r.voided_at")
    .whereIn("d.state", BEING_READ_STATES)
    .where((w) =>
      w
        .whereExists((e) => e.select(q.raw("1")).from("readings as m").whereRaw("m.drop_id = d.id").where({ "m.reviewer_id": reviewerId, "m.status": "draft" }))
        .orWhere((o) =>
          o
            .whereNotExists((e) =>
              e.select(q.raw("1")).from("readings as m").whereRaw("m.drop_id = d.id").where("m.reviewer_id", reviewerId).whereNull("m.supersedes_id"),
            )
            .whereRaw("(select count(*) from readings h where h.drop_id = d.id and h.supersedes_id is null) < 2"),
        ),
    )
    .orderBy([
      { column: "d.placed_at", order: "asc" },
      { column: "d.ordinal", order: "asc" },
    ])
    .limit(limit);
  return rows.map(toDrop);
}

/** The leads' queue: drops whose two readings disagree, the oldest first (not of a voided run). */
export async function listDiscrepancies(q: Db, limit = 200): Promise<DropRow[]> {
  return (await base(q).where("d.state", "discrepancy").whereNull("r.voided_at").orderBy("d.state_changed_at", "asc").limit(limit)).map(toDrop);
}

/** Drops of a run not yet settled: a ball has a result only when there are none. */
export async function countUnsettledDrops(q: Db, runId: string): Promise<number> {
  const r = await q("drops").where({ run_id: runId }).whereNotIn("state", SETTLED_STATES).count<{ n: string }[]>("* as n").first();
  return Number(r?.n ?? 0);
}
