import "server-only";
import type { Db } from "../db";

export interface SignatureRow {
  id: string;
  submissionId: string;
  revision: number;
  signedBy: string;
  signedByName: string;
  signedAt: Date;
  meaning: string;
  results: unknown;
  changes: unknown;
}

export interface ReopeningRow {
  id: string;
  submissionId: string;
  revision: number;
  reason: string;
  reopenedBy: string;
  reopenedByName: string;
  reopenedAt: Date;
}

const toSignature = (r: Record<string, any>): SignatureRow => ({
  id: r.id,
  submissionId: r.submission_id,
  revision: r.revision,
  signedBy: r.signed_by,
  signedByName: r.signed_by_name,
  signedAt: r.signed_at,
  meaning: r.meaning,
  results: r.results,
  changes: r.changes,
});

export async function listSignatures(q: Db, submissionId: string): Promise<SignatureRow[]> {
  const rows = await q("signatures as g")
    .join("users as u", "u.id", "g.signed_by")
    .select("g.*", "u.name as signed_by_name")
    .where("g.submission_id", submissionId)
    .orderBy("g.revision");
  return rows.map(toSignature);
}

export async function listReopenings(q: Db, submissionId: string): Promise<ReopeningRow[]> {
  const rows = await q("reopenings as o")
    .join("users as u", "u.id", "o.reopened_by")
    .select("o.*", "u.name as reopened_by_name")
    .where("o.submission_id", submissionId)
    .orderBy("o.revision");
  return rows.map((r) => ({
    id: r.id,
    submissionId: r.submission_id,
    revision: r.revision,
    reason: r.reason,
    reopenedBy: r.reopened_by,
    reopenedByName: r.reopened_by_name,
    reopenedAt: r.reopened_at,
  }));
}

export async function insertSignature(
  q: Db,
  s: { submissionId: string; revision: number; signedBy: string; results: unknown; changes: unknown },
): Promise<string> {
  const [row] = await q("signatures")
    .insert({
      submission_id: s.submissionId,
      revision: s.revision,
      signed_by: s.signedBy,
      results: JSON.stringify(s.results),
      changes: s.changes === null ? null : JSON.stringify(s.changes),
    })
    .returning("id");
  return row.id;
}

export async function insertReopening(q: Db, r: { submissionId: string; revision: number; reason: string; reopenedBy: string }): Promise<string> {
  const [row] = await q("reopenings")
    .insert({ submission_id: r.submissionId, revision: r.revision, reason: r.reason, reopened_by: r.reopenedBy })
    .returning("id");
  return row.id;
}

/** Every drop of the submission's runs moves to a new state (signing off, or back on re-opening). */
export async function setDropStates(q: Db, submissionId: string, from: readonly string[], to: string): Promise<number> {
  return q("drops")
    .whereIn("state", from)
    .whereIn("run_id", q("runs as r").join("samples as s", "s.id", "r.sample_id").where("s.submission_id", submissionId).select("r.id"))
    .update({ state: to, state_changed_at: q.fn.now() });
}

/** On re-opening, signed-off drops go back to what settled them: a ruling, or agreement. */
export async function restoreDropStates(q: Db, submissionId: string): Promise<void> {
  await q.raw(
    `update drops d set state = case when exists (select 1 from rulings x where x.drop_id = d.id) then 'ruled' else 'agreed' end,
            state_changed_at = now()
       from runs r join samples s on s.id = r.sample_id
      where r.id = d.run_id and s.submission_id = ? and d.state = 'signed off'`,
    [submissionId],
  );
}

/**
 * Holds the submission row until the transaction ends. FOR KEY SHARE conflicts with the FOR UPDATE
 * that sign-off and re-opening take, and with nothing a change of records or of the submission's
 * other columns takes, so changes run side by side and only sign-off waits for them (or they for it).
 */
export async function holdSubmission(q: Db, submissionId: string): Promise<void> {
  await q("submissions").where({ id: submissionId }).forKeyShare().select("id");
}

/** The submission a drop, or the drop of a reading, belongs to (no lock). */
export async function submissionOfDrop(q: Db, of: { dropId: string } | { readingId: string }): Promise<string | null> {
  const query = q("drops as d").join("runs as r", "r.id", "d.run_id").join("samples as s", "s.id", "r.sample_id").select("s.submission_id").first();
  if ("dropId" in of) query.where("d.id", of.dropId);
  else query.whereRaw("d.id = (select drop_id from readings where id = ?)", [of.readingId]);
  const row = await query;
  return row?.submission_id ?? null;
}
