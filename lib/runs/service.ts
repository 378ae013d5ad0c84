import "server-only";
import type { Actor } from "../auth/actor";
import { recordChange } from "../audit/record";
import { db, type Db } from "../db";
import { findEdition } from "../editions/queries";
import { AppError } from "../errors";
import { findSample } from "../samples/queries";
import { notifyBelowLimit } from "../notifications/events";
import { assertUnlocked, lockedReason } from "../signoff/lock";
import { visibleSample } from "../samples/service";
import { assertCanEditIntake, assertLead, assertVisible } from "../submissions/policy";
import { findSubmission, updateSubmissionRow } from "../submissions/queries";
import { toCelsius } from "../units/rules";
import type { ConditionLimits } from "./conditions";
import { findRun, insertRun, listRunsOfSubmission, setAcceptance, setVoid, updateRunRow, type RunColumns, type RunRow } from "./queries";
import { countingRun } from "./rules";
import type { RunValues } from "./schema";
import { toRunView, type RunView } from "./view";

function toColumns(v: RunValues): RunColumns {
  const { roomTemp, surfaceTemp, ...rest } = v;
  return {
    ...rest,
    dispenserCheck: rest.dispenserCheck ?? null,
    roomTempC: toCelsius(roomTemp.value, roomTemp.unit),
    surfaceTempC: toCelsius(surfaceTemp.value, surfaceTemp.unit),
  };
}

/** With why the run's forms are closed while its submission is signed off (null while it may change). */
export type RunDetail = RunView & {
  submissionId: string;
  submissionReference: string;
  sampleSerial: string;
  limits: ConditionLimits;
  lockedReason: string | null;
};

async function viewOf(q: Db, run: RunRow): Promise<RunDetail> {
  const sample = (await findSample(q, run.sampleId))!;
  const submission = (await findSubmission(q, sample.submissionId))!;
  const edition = (await findEdition(q, submission.editionId))!;
  const limits = {
    minAcclimationH: edition.minAcclimationH,
    surfaceTempMinC: edition.surfaceTempMinC,
    surfaceTempMaxC: edition.surfaceTempMaxC,
    roughnessMaxSdUm: edition.roughnessMaxSdUm,
  };
  const lock = await lockedReason(submission.id, q);
  return {
    ...toRunView(run, sample, edition),
    submissionId: submission.id,
    submissionReference: submission.reference,
    sampleSerial: sample.serial,
    limits,
    lockedReason: lock,
  };
}

async function visibleRun(actor: Actor, id: string, q: Db = db()): Promise<RunRow> {
  const run = await findRun(q, id);
  if (!run) throw new AppError("not_found", "No such run.");
  const sample = (await findSample(q, run.sampleId))!;
  assertVisible(actor, (await findSubmission(q, sample.submissionId))!.organisationId, "run");
  return run;
}

/** Records one oil absorption test of a sample, with one drop per the edition's drops per ball. */
export async function recordRun(actor: Actor, sampleId: string, v: RunValues): Promise<RunDetail> {
  const sample = await visibleSample(actor, sampleId);
  assertCanEditIntake(actor);
  return db().transaction(async (trx) => {
    const submission = (await findSubmission(trx, sample.submissionId))!;
    await assertUnlocked(trx, submission.id);
    const edition = (await findEdition(trx, submission.editionId))!;
    const id = await insertRun(trx, sampleId, actor.id, toColumns(v), edition.dropsPerBall);
    if (submission.status === "received") await updateSubmissionRow(trx, submission.id, { status: "testing" });
    const view = await viewOf(trx, (await findRun(trx, id))!);
    await recordChange(trx, actor, { action: "run.created", entity: "run", entityId: id, after: snapshot(view) });
    return view;
  });
}

export async function getRun(actor: Actor, id: string): Promise<RunDetail> {
  return viewOf(db(), await visibleRun(actor, id));
}

export async function updateRun(actor: Actor, id: string, v: RunValues): Promise<RunDetail> {
  const run = await visibleRun(actor, id);
  assertCanEditIntake(actor);
  return db().transaction(async (trx) => {
    const submissionId = (await findSample(trx, run.sampleId))!.submissionId;
    await assertUnlocked(trx, submissionId);
    const before = await viewOf(trx, notVoided((await findRun(trx, id, { lock: true }))!, "its conditions no longer change"));
    await updateRunRow(trx, id, toColumns(v));
    const after = await viewOf(trx, (await findRun(trx, id))!);
    await recordChange(trx, actor, { action: "run.updated", entity: "run", entityId: id, before: snapshot(before), after: snapshot(after) });
    // Corrected conditions can clear the run's flags, and with them give its ball a result.
    await notifyBelowLimit(trx, { runId: id, submissionId });
    return after;
  });
}

/** A lead accepts a run whose conditions are flagged, with a written reason. */
export async function acceptRun(actor: Actor, id: string, reason: string): Promise<RunDetail> {
  const run = await visibleRun(actor, id);
  assertLead(actor, "accept a run with flagged conditions");
  return db().transaction(async (trx) => {
    const submissionId = (await findSample(trx, run.sampleId))!.submissionId;
    await assertUnlocked(trx, submissionId);
    const before = await viewOf(trx, notVoided((await findRun(trx, id, { lock: true }))!, "there is nothing to accept"));
    if (before.flags.length === 0) throw new AppError("conflict", "This run's conditions raise no warning, so there is nothing to accept.");
    if (before.acceptedAt) throw new AppError("conflict", `This run was already accepted by ${before.acceptedByName}.`);
    await setAcceptance(trx, id, actor.id, reason);
    const after = await viewOf(trx, (await findRun(trx, id))!);
    await recordChange(trx, actor, {
      action: "run.accepted",
      entity: "run",
      entityId: id,
      before: { flags: before.flags },
      after: { flags: after.flags, reason },
    });
    // The run's ball now has a result if its drops are settled: it may be below the limit.
    await notifyBelowLimit(trx, { runId: id, submissionId });
    return after;
  });
}

/**
 * A lead voids a run that must not count, with a reason. Nothing is deleted: the run and its drops
 * stay on record, shown as voided. A void is final; a run to count instead is recorded anew.
 */
export async function voidRun(actor: Actor, id: string, reason: string): Promise<RunDetail> {
  const run = await visibleRun(actor, id);
  assertLead(actor, "void a run");
  return db().transaction(async (trx) => {
    const submissionId = (await findSample(trx, run.sampleId))!.submissionId;
    await assertUnlocked(trx, submissionId);
    const before = notVoided((await findRun(trx, id, { lock: true }))!, "a voided run stays voided. Record a new run if the ball is to be tested again");
    await setVoid(trx, id, actor.id, reason);
    const after = await viewOf(trx, (await findRun(trx, id))!);
    await recordChange(trx, actor, {
      action: "run.voided",
      entity: "run",
      entityId: id,
      before: { voidedAt: before.voidedAt },
      after: { voidedAt: after.voidedAt, reason },
    });
    // The ball's run before this one counts again, and may give it a result below the limit: the
    // check is on that run (the voided one's unsettled drops no longer hold the ball's result).
    const counting = countingRun((await listRunsOfSubmission(trx, submissionId)).filter((r) => r.sampleId === run.sampleId));
    if (counting) await notifyBelowLimit(trx, { runId: counting.id, submissionId });
    return after;
  });
}

function notVoided(run: RunRow, so: string): RunRow {
  if (!run.voidedAt) return run;
  throw new AppError("conflict", `This run was already voided by ${run.voidedByName} on ${run.voidedAt.toISOString().slice(0, 10)}: ${so}.`);
}

function snapshot(r: RunDetail) {
  const {
    technicianName: _t,
    acceptedByName: _a,
    voidedByName: _v,
    dropCount: _d,
    roughness: _r,
    limits: _l,
    submissionReference: _s,
    lockedReason: _k,
    ...rest
  } = r;
  return rest;
}
