import "server-only";
import type { Knex } from "knex";
import type { Db } from "../db";
import { env } from "../env";
import type { DropRow } from "../drops/queries";
import { loadSubmissionResults } from "../results/service";
import { decimalsOf } from "../numbers";
import { judgedThresholds, secsAgainst } from "../results/words";
import { findSubmission } from "../submissions/queries";
import { queueMail } from "./outbox";
import { insertBelowLimitReports, listReportedBelow } from "./report-queries";
import { countUnsettledDrops } from "../drops/queries";
import { organisationRecipients, recipientsWithRole } from "./queries";
import { belowLimitMail, discrepancyMail, resultsReleasedMail } from "./templates";

// Events that write mail: each takes the event's transaction, so the mail exists exactly when the
// event does, and is delivered later by the worker.

/** Leads: a drop's two readings disagree. Once per drop. */
export async function notifyDiscrepancy(trx: Db, drop: DropRow, differenceS: number | null): Promise<string[]> {
  const mail = discrepancyMail({
    appUrl: env().APP_URL,
    dropId: drop.id,
    reference: drop.submissionReference,
    sampleSerial: drop.sampleSerial,
    ordinal: drop.ordinal,
    differenceS,
  });
  return queueMail(trx, await recipientsWithRole(trx, "lead"), mail, `discrepancy:${drop.id}`);
}

/**
 * Manufacturer contacts: a ball's result fell below the limit during testing. Called when a drop
 * settles; each ball is reported once (below_limit_reports keeps the record). Cheap on the reading
 * path: a ball has a result only once every drop of its run has settled, so until this drop
 * completes its run one count is all it costs; the results are computed only when it does.
 */
export async function notifyBelowLimit(trx: Db, drop: Pick<DropRow, "runId" | "submissionId">): Promise<string[]> {
  // In a savepoint: whatever goes wrong in computing the results is logged and never rolls back
  // the reading, ruling or run change that called it.
  try {
    return await (trx as Knex.Transaction).transaction((sp) => belowLimitMails(sp, drop));
  } catch (err) {
    console.error(`[notifications] the below-limit check of submission ${drop.submissionId} failed; the change stands:`, err);
    return [];
  }
}

async function belowLimitMails(trx: Db, drop: Pick<DropRow, "runId" | "submissionId">): Promise<string[]> {
  if ((await countUnsettledDrops(trx, drop.runId)) > 0) return [];
  const s = await findSubmission(trx, drop.submissionId);
  if (!s) return [];
  const results = await loadSubmissionResults(trx, s);
  const reported = new Set(await listReportedBelow(trx, s.id));
  const fresh = results.balls.filter((b) => results.decision.belowBalls.includes(b.serial) && !reported.has(b.sampleId));
  if (!fresh.length) return [];
  await insertBelowLimitReports(
    trx,
    s.id,
    fresh.map((b) => b.sampleId),
  );
  const { limits } = results;
  const mail = belowLimitMail({
    appUrl: env().APP_URL,
    submissionId: s.id,
    reference: s.reference,
    modelName: s.modelName,
    judged: limits.criterion === "every_drop" ? "shortest drop" : "mean",
    limit: `${limits.minAbsorptionS.toFixed(Math.max(1, decimalsOf(limits.minAbsorptionS)))} s`,
    balls: fresh.map((b) => ({ serial: b.serial, value: secsAgainst(b.value as number, judgedThresholds(limits)) })),
    decides: limits.belowMinimumRule === "fails",
  });
  return queueMail(trx, await organisationRecipients(trx, s.organisationId), mail);
}

/** Manufacturer contacts: a lead released the results (called by the sign-off, in its transaction). */
export async function notifyResultsReleased(trx: Db, submissionId: string, revision: number): Promise<string[]> {
  const s = await findSubmission(trx, submissionId);
  if (!s) return [];
  const mail = resultsReleasedMail({ appUrl: env().APP_URL, submissionId: s.id, reference: s.reference, modelName: s.modelName, revision });
  return queueMail(trx, await organisationRecipients(trx, s.organisationId), mail, `released:${s.id}:${revision}`);
}
