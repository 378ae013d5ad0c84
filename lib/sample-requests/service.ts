import "server-only";
import type { Actor } from "../auth/actor";
import { assertCanAcknowledge } from "./policy";
import { recordChange } from "../audit/record";
import { db } from "../db";
import { env } from "../env";
import { AppError } from "../errors";
import { queueMail } from "../notifications/outbox";
import { organisationRecipients } from "../notifications/queries";
import { samplesRequestedMail } from "../notifications/templates";
import { assertCanEditIntake } from "../submissions/policy";
import { lockSubmission } from "../submissions/queries";
import { visibleSubmission } from "../submissions/service";
import { acknowledgeRow, findSampleRequest, insertSampleRequest, listSampleRequests as selectRequests, startRound } from "./queries";
import type { SampleRequestRow } from "./view";
import type { AcknowledgeInput, SampleRequestInput } from "./schema";

// Requests for more samples: the lab asks for the next round, the manufacturer acknowledges and
// says how and when it ships. Each step is audited; the request's mail is written in its transaction.

/** A submission's requests, for staff and for the manufacturer that owns it. */
export async function listSampleRequests(actor: Actor, submissionId: string): Promise<SampleRequestRow[]> {
  await visibleSubmission(actor, submissionId);
  return selectRequests(db(), submissionId);
}

/** Asks the manufacturer for the next round's samples; the submission moves to that round and waits. */
export async function requestSamples(actor: Actor, submissionId: string, v: SampleRequestInput): Promise<SampleRequestRow> {
  assertCanEditIntake(actor);
  if (v.dueBy < new Date().toISOString().slice(0, 10))
    throw new AppError("validation", "The due date is in the past.", { fields: { dueBy: "Choose today or a later date." } });
  return db().transaction(async (trx) => {
    await lockSubmission(trx, submissionId);
    const s = await visibleSubmission(actor, submissionId, trx);
    if (s.status === "released" || s.status === "decided") throw new AppError("conflict", `This submission is ${s.status}: no more samples can be requested.`);
    if (s.status === "awaiting_samples") throw new AppError("conflict", `Round ${s.currentRound} is already waiting for its samples.`);
    const round = s.currentRound + 1;
    const id = await insertSampleRequest(trx, { submissionId, round, ...v, requestedBy: actor.id });
    await startRound(trx, submissionId, round);
    const mail = samplesRequestedMail({
      appUrl: env().APP_URL,
      submissionId,
      reference: s.reference,
      modelName: s.modelName,
      round,
      count: v.count,
      weight: v.weight,
      dueBy: v.dueBy,
      note: v.note,
    });
    await queueMail(trx, await organisationRecipients(trx, s.organisationId), mail, `samples:${id}`);
    await recordChange(trx, actor, {
      action: "sample_request.created",
      entity: "sample_request",
      entityId: id,
      before: { currentRound: s.currentRound, status: s.status },
      after: { submissionId, round, ...v, status: "awaiting_samples" },
    });
    return (await findSampleRequest(trx, id))!;
  });
}

/** The manufacturer acknowledges a request of its own organisation and gives the shipping details. */
export async function acknowledgeRequest(actor: Actor, id: string, v: AcknowledgeInput): Promise<SampleRequestRow> {
  assertCanAcknowledge(actor);
  return db().transaction(async (trx) => {
    const r = await findSampleRequest(trx, id, { lock: true });
    if (!r) throw new AppError("not_found", "No such request.");
    await visibleSubmission(actor, r.submissionId, trx).catch(() => {
      throw new AppError("not_found", "No such request.");
    });
    if (r.acknowledgedAt) throw new AppError("conflict", "This request is already acknowledged.");
    await acknowledgeRow(trx, id, { by: actor.id, shippingDetails: v.shippingDetails, shippedOn: v.shippedOn ?? null });
    await recordChange(trx, actor, {
      action: "sample_request.acknowledged",
      entity: "sample_request",
      entityId: id,
      after: { shippingDetails: v.shippingDetails, shippedOn: v.shippedOn ?? null },
    });
    return (await findSampleRequest(trx, id))!;
  });
}
