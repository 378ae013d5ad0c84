import type { Db } from "../db";
import { AppError } from "../errors";
import { findSubmission } from "../submissions/queries";
import { listReopenings, listSignatures } from "./queries";
import { currentRevision, lockReason } from "./rules";

/**
 * Refuses a change to a submission's records while its revision in force is signed off. Call it
 * inside the changing transaction, after locking the record being changed.
 */
export async function assertUnlocked(q: Db, submissionId: string): Promise<void> {
  const signed = await listSignatures(q, submissionId);
  if (signed.length === 0) return;
  const sub = await findSubmission(q, submissionId);
  const reason = lockReason({
    reference: sub?.reference ?? "",
    signedRevisions: signed.map((s) => s.revision),
    reopenedRevisions: (await listReopenings(q, submissionId)).map((r) => r.revision),
  });
  if (reason) throw new AppError("conflict", reason);
}

/** The revision in force and whether it is signed off, for pages that show the lock. */
export async function lockStatus(q: Db, submissionId: string): Promise<{ revision: number; locked: boolean }> {
  const [signed, reopened] = await Promise.all([listSignatures(q, submissionId), listReopenings(q, submissionId)]);
  const revision = currentRevision({ reopenedRevisions: reopened.map((r) => r.revision) });
  return { revision, locked: signed.some((s) => s.revision === revision) };
}
