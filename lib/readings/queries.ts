import "server-only";
import type { Db } from "../db";
import type { Marks } from "./rules";

export interface ReadingRow extends Marks {
  id: string;
  dropId: string;
  clipId: string;
  reviewerId: string;
  reviewerName: string;
  slot: number;
  status: "draft" | "submitted";
  supersedesId: string | null;
  correctionReason: string | null;
  createdAt: Date;
  updatedAt: Date;
  submittedAt: Date | null;
}

/**
 * SQL condition on a reading aliased g: submitted, and not replaced by a submitted correction (the
 * same rule as lib/readings/rules.ts currentReadings). One text for every query that reads results.
 */
export const CURRENT_SUBMITTED_G = "g.status = 'submitted' and not exists (select 1 from readings c where c.supersedes_id = g.id and c.status = 'submitted')";

const int = (v: unknown) => (v === null || v === undefined ? null : Number(v));

function toReading(r: Record<string, any>): ReadingRow {
  return {
    id: r.id,
    dropId: r.drop_id,
    clipId: r.clip_id,
    reviewerId: r.reviewer_id,
    reviewerName: r.reviewer_name,
    slot: r.slot,
    status: r.status,
    dispenseFrame: r.dispense_frame,
    clearFrame: r.clear_frame,
    dispensePts: int(r.dispense_pts),
    clearPts: int(r.clear_pts),
    timeS: r.time_s,
    uncertaintyStandardS: r.uncertainty_standard_s,
    uncertaintyExpandedS: r.uncertainty_expanded_s,
    supersedesId: r.supersedes_id,
    correctionReason: r.correction_reason,
    createdAt: r.created_at,
    updatedAt: r.updated_at,
    submittedAt: r.submitted_at,
  };
}

const base = (q: Db) => q("readings as g").join("users as u", "u.id", "g.reviewer_id").select("g.*", "u.name as reviewer_name");

export async function findReading(q: Db, id: string): Promise<ReadingRow | undefined> {
  const r = await base(q).where("g.id", id).first();
  return r ? toReading(r) : undefined;
}

export async function listReadingsOfDrop(q: Db, dropId: string): Promise<ReadingRow[]> {
  return (await base(q).where("g.drop_id", dropId).orderBy("g.created_at")).map(toReading);
}

export async function countReadingsOfDrop(q: Db, dropId: string): Promise<number> {
  const r = await q("readings").where({ drop_id: dropId }).count<{ count: string }[]>("* as count").first();
  return Number(r?.count ?? 0);
}

export async function listReadingsOfDrops(q: Db, dropIds: string[]): Promise<ReadingRow[]> {
  if (dropIds.length === 0) return [];
  return (await base(q).whereIn("g.drop_id", dropIds).orderBy("g.created_at")).map(toReading);
}

export type MarkColumns = Marks;

function markColumns(m: MarkColumns) {
  return {
    dispense_frame: m.dispenseFrame,
    clear_frame: m.clearFrame,
    dispense_pts: m.dispensePts,
    clear_pts: m.clearPts,
    time_s: m.timeS,
    uncertainty_standard_s: m.uncertaintyStandardS,
    uncertainty_expanded_s: m.uncertaintyExpandedS,
  };
}

export async function insertReading(
  q: Db,
  r: { dropId: string; clipId: string; reviewerId: string; slot: number; supersedesId: string | null; correctionReason: string | null } & MarkColumns,
  reviewerName = "",
): Promise<ReadingRow> {
  const [row] = await q("readings")
    .insert({
      drop_id: r.dropId,
      clip_id: r.clipId,
      reviewer_id: r.reviewerId,
      slot: r.slot,
      supersedes_id: r.supersedesId,
      correction_reason: r.correctionReason,
      ...markColumns(r),
    })
    .returning("*");
  return toReading({ ...row, reviewer_name: reviewerName });
}

export async function updateDraftMarks(q: Db, id: string, m: MarkColumns): Promise<void> {
  await q("readings")
    .where({ id, status: "draft" })
    .update({ ...markColumns(m), updated_at: q.fn.now() });
}

/** Returns the moment recorded as submitted. */
export async function markSubmitted(q: Db, id: string): Promise<Date> {
  const [row] = await q("readings")
    .where({ id, status: "draft" })
    .update({ status: "submitted", submitted_at: q.fn.now(), updated_at: q.fn.now() })
    .returning("submitted_at");
  return row.submitted_at;
}

export async function deleteDraft(q: Db, id: string): Promise<void> {
  await q("readings").where({ id, status: "draft" }).delete();
}
