import "server-only";
import type { Db } from "../db";
import type { Marks } from "../readings/rules";

export interface RulingRow {
  id: string;
  dropId: string;
  chosen: "first" | "second" | "third";
  readingId: string;
  timeS: number;
  reason: string;
  ruledBy: string;
  ruledByName: string;
  ruledAt: Date;
}

function toRuling(r: Record<string, any>): RulingRow {
  return {
    id: r.id,
    dropId: r.drop_id,
    chosen: r.chosen,
    readingId: r.reading_id,
    timeS: r.time_s,
    reason: r.reason,
    ruledBy: r.ruled_by,
    ruledByName: r.ruled_by_name,
    ruledAt: r.ruled_at,
  };
}

const rulings = (q: Db) => q("rulings as x").join("users as u", "u.id", "x.ruled_by").select("x.*", "u.name as ruled_by_name");

export async function findRulingOfDrop(q: Db, dropId: string): Promise<RulingRow | undefined> {
  const r = await rulings(q).where("x.drop_id", dropId).first();
  return r ? toRuling(r) : undefined;
}

/** A ruling with the ball and drop it settled and the reader of the reading it accepted. */
export interface SubmissionRulingRow extends RulingRow {
  serial: string;
  round: number;
  dropOrdinal: number;
  acceptedReader: string;
}

/** Every ruling on the submission's drops, by ball and drop. */
export async function listRulingsOfSubmission(q: Db, submissionId: string): Promise<SubmissionRulingRow[]> {
  const rows = await rulings(q)
    .join("drops as d", "d.id", "x.drop_id")
    .join("runs as r", "r.id", "d.run_id")
    .join("samples as s", "s.id", "r.sample_id")
    .join("readings as g", "g.id", "x.reading_id")
    .join("users as gu", "gu.id", "g.reviewer_id")
    .select("s.serial", "s.round", "d.ordinal", "gu.name as accepted_reader")
    .where("s.submission_id", submissionId)
    .orderBy([{ column: "s.round" }, { column: "s.serial" }, { column: "d.ordinal" }]);
  return rows.map((r) => ({ ...toRuling(r), serial: r.serial, round: r.round, dropOrdinal: r.ordinal, acceptedReader: r.accepted_reader }));
}

export async function insertRuling(q: Db, r: Omit<RulingRow, "id" | "ruledAt" | "ruledByName">): Promise<{ id: string; ruledAt: Date }> {
  const [row] = await q("rulings")
    .insert({ drop_id: r.dropId, chosen: r.chosen, reading_id: r.readingId, time_s: r.timeS, reason: r.reason, ruled_by: r.ruledBy })
    .returning(["id", "ruled_at"]);
  return { id: row.id, ruledAt: row.ruled_at };
}

/** The lead's third reading, stored submitted at once (slot 3): it is evidence like the other two. */
export async function insertThirdReading(q: Db, r: { dropId: string; clipId: string; reviewerId: string } & Marks): Promise<string> {
  const [row] = await q("readings")
    .insert({
      drop_id: r.dropId,
      clip_id: r.clipId,
      reviewer_id: r.reviewerId,
      slot: 3,
      status: "submitted",
      submitted_at: q.fn.now(),
      dispense_frame: r.dispenseFrame,
      clear_frame: r.clearFrame,
      dispense_pts: r.dispensePts,
      clear_pts: r.clearPts,
      time_s: r.timeS,
      uncertainty_standard_s: r.uncertaintyStandardS,
      uncertainty_expanded_s: r.uncertaintyExpandedS,
    })
    .returning("id");
  return row.id;
}

export async function setRuled(q: Db, dropId: string, timeS: number): Promise<void> {
  await q("drops").where({ id: dropId }).update({ state: "ruled", agreed_time_s: timeS, state_changed_at: q.fn.now() });
}
