import "server-only";
import { db, type Db } from "../db";
import { AppError } from "../errors";
import { findSubmission } from "../submissions/queries";
import { holdSubmission, listReopenings, listSignatures, submissionOfDrop } from "./queries";
import { currentRevision, lockReason } from "./rules";

/**
 * Refuses a change to a submission's records while its revision in force is signed off. Call it
 * inside the changing transaction, before locking any of the submission's own records (runs, drops):
 * it holds the submission row against sign-off and re-opening until the change commits. So a
 * sign-off either waits for the change and sees it, or comes first and the change is refused.
 * The lock (FOR KEY SHARE) does not hold up other changes or ordinary updates of the submission.
 */
export async function assertUnlocked(q: Db, submissionId: string): Promise<void> {
  await holdSubmission(q, submissionId);
  const reason = await reasonOf(q, submissionId);
  if (reason) throw new AppError("conflict", reason);
}

/** The same for a change that starts from a drop or one of its readings: call it before locking the drop. */
export async function assertDropUnlocked(q: Db, of: { dropId: string } | { readingId: string }): Promise<void> {
  const submissionId = await submissionOfDrop(q, of);
  if (submissionId) await assertUnlocked(q, submissionId);
}

async function reasonOf(q: Db, submissionId: string): Promise<string | null> {
  const signed = await listSignatures(q, submissionId);
  if (signed.length === 0) return null;
  const sub = await findSubmission(q, submissionId);
  return lockReason({
    reference: sub?.reference ?? "",
    signedRevisions: signed.map((s) => s.revision),
    reopenedRevisions: (await listReopenings(q, submissionId)).map((r) => r.revision),
  });
}

/** Why the submission's records cannot change now (signed off), or null: for pages that hide their forms. */
export async function lockedReason(submissionId: string, q: Db = db()): Promise<string | null> {
  return reasonOf(q, submissionId);
}

/** The revision in force and whether it is signed off, for pages that show the lock. */
export async function lockStatus(q: Db, submissionId: string): Promise<{ revision: number; locked: boolean }> {
  const [signed, reopened] = await Promise.all([listSignatures(q, submissionId), listReopenings(q, submissionId)]);
  const revision = currentRevision({ reopenedRevisions: reopened.map((r) => r.revision) });
  return { revision, locked: signed.some((s) => s.revision === revision) };
}
