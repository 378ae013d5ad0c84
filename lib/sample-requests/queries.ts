import "server-only";
import type { Db } from "../db";
import type { SampleRequestRow } from "./view";

const base = (q: Db) =>
  q("sample_requests as r")
    .join("users as rb", "rb.id", "r.requested_by")
    .leftJoin("users as ab", "ab.id", "r.acknowledged_by")
    .select(
      "r.id",
      "r.submission_id as submissionId",
      "r.round",
      "r.count",
      "r.weight",
      q.raw("to_char(r.due_by, 'YYYY-MM-DD') as \"dueBy\""),
      "r.note",
      "rb.name as requestedByName",
      "r.requested_at as requestedAt",
      "ab.name as acknowledgedByName",
      "r.acknowledged_at as acknowledgedAt",
      "r.shipping_details as shippingDetails",
      q.raw("to_char(r.shipped_on, 'YYYY-MM-DD') as \"shippedOn\""),
    );

export async function listSampleRequests(q: Db, submissionId: string): Promise<SampleRequestRow[]> {
  return base(q).where("r.submission_id", submissionId).orderBy("r.round");
}

export async function findSampleRequest(q: Db, id: string, opts: { lock?: boolean } = {}): Promise<SampleRequestRow | undefined> {
  const b = base(q).where("r.id", id).first();
  if (opts.lock) b.forUpdate("r");
  return b;
}

export async function insertSampleRequest(
  q: Db,
  v: { submissionId: string; round: number; count: number; weight: string; dueBy: string; note: string; requestedBy: string },
): Promise<string> {
  const [row] = await q("sample_requests")
    .insert({ submission_id: v.submissionId, round: v.round, count: v.count, weight: v.weight, due_by: v.dueBy, note: v.note, requested_by: v.requestedBy })
    .returning("id");
  return row.id;
}

export async function acknowledgeRow(q: Db, id: string, v: { by: string; shippingDetails: string; shippedOn: string | null }): Promise<void> {
  await q("sample_requests")
    .where({ id })
    .update({ acknowledged_by: v.by, acknowledged_at: q.fn.now(), shipping_details: v.shippingDetails, shipped_on: v.shippedOn });
}

/** Raises the submission to the requested round and marks it waiting for the samples. */
export async function startRound(q: Db, submissionId: string, round: number): Promise<void> {
  await q("submissions").where({ id: submissionId }).update({ current_round: round, status: "awaiting_samples", updated_at: q.fn.now() });
}
