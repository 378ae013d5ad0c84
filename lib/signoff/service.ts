import "server-only";
import { SIGNABLE_STATES } from "../drops/states";
import type { Actor } from "../auth/actor";
import { recordChange } from "../audit/record";
import { verifyPassword } from "../auth/password";
import { db } from "../db";
import { AppError } from "../errors";
import { getSubmissionResults } from "../results/service";
import type { ResultsView } from "../results/view";
import { assertLead } from "../submissions/policy";
import { findSubmission, lockSubmission, updateSubmissionRow } from "../submissions/queries";
import { findUserById } from "../users/queries";
import { notifyResultsReleased } from "../notifications/events";
import { insertReopening, insertSignature, listReopenings, listSignatures, restoreDropStates, setDropStates } from "./queries";
import { currentRevision, diffResults, lockReason, signRefusal, type ResultChanges, type Snapshot } from "./rules";
import type { ReopenInput, SignInput } from "./schema";

// A lead signs a submission's results off (re-entering their password), which releases and locks
// them; re-opening, with a reason, starts the next revision.

export interface SignOffView {
  submissionId: string;
  revision: number;
  locked: boolean;
  signatures: { revision: number; signedBy: string; signedAt: string; meaning: string; changes: ResultChanges | null }[];
  reopenings: { revision: number; reason: string; reopenedBy: string; reopenedAt: string }[];
}

async function lockState(q: ReturnType<typeof db>, submissionId: string, reference: string) {
  const [signed, reopened] = await Promise.all([listSignatures(q, submissionId), listReopenings(q, submissionId)]);
  const state = { reference, signedRevisions: signed.map((s) => s.revision), reopenedRevisions: reopened.map((r) => r.revision) };
  return { signed, reopened, state, revision: currentRevision(state), locked: lockReason(state) !== null };
}

export async function getSignOff(actor: Actor, submissionId: string): Promise<SignOffView> {
  assertLead(actor, "see the sign-off of a submission");
  const s = await findSubmission(db(), submissionId);
  if (!s) throw new AppError("not_found", "No such submission.");
  const { signed, reopened, revision, locked } = await lockState(db(), submissionId, s.reference);
  return {
    submissionId,
    revision,
    locked,
    signatures: signed.map((g) => ({
      revision: g.revision,
      signedBy: g.signedByName,
      signedAt: g.signedAt.toISOString(),
      meaning: g.meaning,
      changes: (g.changes as ResultChanges | null) ?? null,
    })),
    reopenings: reopened.map((r) => ({ revision: r.revision, reason: r.reason, reopenedBy: r.reopenedByName, reopenedAt: r.reopenedAt.toISOString() })),
  };
}

const snapshotOf = (r: ResultsView): Snapshot => ({
  balls: r.balls.map((b) => ({ sampleId: b.sampleId, serial: b.serial, mean: b.mean, status: b.status })),
  decision: { decision: r.decision.decision },
});

export async function signOff(actor: Actor, submissionId: string, input: SignInput): Promise<SignOffView> {
  assertLead(actor, "sign off results");
  const user = await findUserById(db(), actor.id);
  if (!user || !(await verifyPassword(input.password, user.passwordHash))) {
    throw new AppError("validation", "That password is not right: the signature was not made.", { fields: { password: "That password is not right." } });
  }
  await db().transaction(async (trx) => {
    await lockSubmission(trx, submissionId);
    // Computed under the submission's lock, so what is signed is what the snapshot holds.
    const results = await getSubmissionResults(actor, submissionId, trx);
    const refusal = signRefusal({ ballCount: results.balls.length, ...results.decision });
    if (refusal) throw new AppError("conflict", refusal);
    const s = (await findSubmission(trx, submissionId))!;
    const { signed, state, revision } = await lockState(trx, submissionId, s.reference);
    if (lockReason(state)) throw new AppError("conflict", `Submission ${s.reference} is already signed off (revision ${revision}).`);
    // Only the runs that count: a replaced or voided run's unread drops do not hold the sign-off up.
    const unsettled = results.balls.flatMap((b) => b.drops).filter((d) => !d.settled).length;
    if (unsettled > 0)
      throw new AppError(
        "conflict",
        `${unsettled} drop${unsettled === 1 ? " is" : "s are"} not settled yet (unread, read once or in discrepancy); settle every drop before signing off.`,
      );
    const previous = signed.at(-1);
    const changes = previous ? diffResults(previous.results as Snapshot, snapshotOf(results)) : null;
    const id = await insertSignature(trx, { submissionId, revision, signedBy: actor.id, results, changes });
    // The snapshot keeps the whole results view; the diff reads only what it needs from it.
    await updateSubmissionRow(trx, submissionId, { status: "released" });
    await setDropStates(trx, submissionId, SIGNABLE_STATES, "signed off");
    await recordChange(trx, actor, {
      action: "submission.signed_off",
      entity: "submission",
      entityId: submissionId,
      before: { status: s.status },
      after: { status: "released", revision, signatureId: id, meaning: "results reviewed and released", changes },
    });
    await notifyResultsReleased(trx, submissionId, revision);
  });
  return getSignOff(actor, submissionId);
}

export async function reopen(actor: Actor, submissionId: string, input: ReopenInput): Promise<SignOffView> {
  assertLead(actor, "re-open a signed-off submission");
  await db().transaction(async (trx) => {
    await lockSubmission(trx, submissionId);
    const s = await findSubmission(trx, submissionId);
    if (!s) throw new AppError("not_found", "No such submission.");
    const { state, revision } = await lockState(trx, submissionId, s.reference);
    if (!lockReason(state)) throw new AppError("conflict", `Submission ${s.reference} is not signed off, so there is nothing to re-open.`);
    const next = revision + 1;
    await insertReopening(trx, { submissionId, revision: next, reason: input.reason, reopenedBy: actor.id });
    await updateSubmissionRow(trx, submissionId, { status: "testing" });
    await restoreDropStates(trx, submissionId);
    await recordChange(trx, actor, {
      action: "submission.reopened",
      entity: "submission",
      entityId: submissionId,
      before: { status: s.status, revision },
      after: { status: "testing", revision: next, reason: input.reason },
    });
  });
  return getSignOff(actor, submissionId);
}
