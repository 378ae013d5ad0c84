import "server-only";
import type { Actor } from "../auth/actor";
import { db, type Db } from "../db";
import { visibleSubmission } from "../submissions/service";
import type { SubmissionRow } from "../submissions/queries";
import { listReopenings, listSignatures } from "./queries";
import { assertReleasedTo, BEING_REVISED, isReleasedTo, type NOT_RELEASED } from "./release-policy";
import { currentRevision } from "./rules";

// Whether a submission's results are released, and by whose signature: what the portal shows
// before it asks for the results themselves.

export interface ReleaseView {
  submissionId: string;
  state: "released" | "revising" | "not released";
  /** The revision in force. */
  revision: number;
  /** The latest signature: the one in force when released, the last released one while revising. */
  signature: { revision: number; signedBy: string; signedAt: string; meaning: string } | null;
  /** The state in words, for a manufacturer. */
  message: string;
}

/** Refuses the results or the report to a manufacturer before release, in words (reads the signatures only then). */
export async function assertReleased(actor: Actor, s: SubmissionRow, what: keyof typeof NOT_RELEASED, q: Db = db()): Promise<void> {
  if (isReleasedTo(actor, s)) return;
  assertReleasedTo(actor, s, (await listSignatures(q, s.id)).length > 0, what);
}

const NOT_YET = "The laboratory releases the results, with the test report, once a lead has reviewed and signed them off.";

export async function getRelease(actor: Actor, submissionId: string): Promise<ReleaseView> {
  const s = await visibleSubmission(actor, submissionId);
  const [signed, reopened] = await Promise.all([listSignatures(db(), s.id), listReopenings(db(), s.id)]);
  const revision = currentRevision({ reopenedRevisions: reopened.map((r) => r.revision) });
  const last = signed.at(-1);
  const signature = last ? { revision: last.revision, signedBy: last.signedByName, signedAt: last.signedAt.toISOString(), meaning: last.meaning } : null;
  // Only a signature sets "released", and re-opening always leaves it.
  if (s.status === "released") {
    return { submissionId: s.id, state: "released", revision, signature, message: `Revision ${revision} of the results is released.` };
  }
  if (last) return { submissionId: s.id, state: "revising", revision, signature, message: BEING_REVISED };
  return { submissionId: s.id, state: "not released", revision, signature: null, message: NOT_YET };
}
