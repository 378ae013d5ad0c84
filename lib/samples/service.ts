import "server-only";
import type { z } from "zod";
import type { Actor } from "../auth/actor";
import { recordChange } from "../audit/record";
import { db } from "../db";
import { AppError } from "../errors";
import { assertCanEditIntake, assertVisible } from "../submissions/policy";
import { findSubmission, lockSubmission } from "../submissions/queries";
import { assertUnlocked } from "../signoff/lock";
import { visibleSubmission } from "../submissions/service";
import { toGrams } from "../units/rules";
import { parseSampleCsv, type CsvRowError } from "./csv";
import { deleteSampleRow, existingSerials, findSample, insertSamples, updateSampleRow, type SampleRow } from "./queries";
import type { sampleImportSchema, sampleInputSchema, sampleUpdateSchema } from "./schema";
import { toSampleView, type SampleView } from "./view";

type Values<T extends z.ZodType> = z.output<T>;

/** The sample and its submission, for an actor who may see them ("not found" otherwise). */
async function visibleSample(actor: Actor, id: string, q = db()): Promise<SampleRow> {
  const sample = await findSample(q, id);
  if (!sample) throw new AppError("not_found", "No such sample.");
  const submission = (await findSubmission(q, sample.submissionId))!;
  assertVisible(actor, submission.organisationId, "sample");
  return sample;
}

export async function addSample(actor: Actor, submissionId: string, v: Values<typeof sampleInputSchema>): Promise<SampleView> {
  const submission = await visibleSubmission(actor, submissionId);
  assertCanEditIntake(actor);
  return db().transaction(async (trx) => {
    await assertUnlocked(trx, submissionId);
    const [id] = await insertSamples(trx, submissionId, [
      {
        serial: v.serial,
        weightG: toGrams(v.weight.value, v.weight.unit),
        round: v.round ?? submission.currentRound,
        receivedAt: v.receivedAt,
        acclimationStartedAt: v.acclimationStartedAt ?? null,
        notes: v.notes,
      },
    ]);
    const created = (await findSample(trx, id))!;
    await recordChange(trx, actor, { action: "sample.created", entity: "sample", entityId: id, after: snapshot(created) });
    return toSampleView(created);
  });
}

/** All rows or none: any bad row is reported with its line and nothing is saved. */
export async function importSamples(actor: Actor, submissionId: string, v: Values<typeof sampleImportSchema>): Promise<{ created: number }> {
  const submission = await visibleSubmission(actor, submissionId);
  assertCanEditIntake(actor);
  const parsed = parseSampleCsv(v.csv, v.unit);
  if (!parsed.ok) throw csvError(parsed.errors);
  return db().transaction(async (trx) => {
    await lockSubmission(trx, submissionId);
    await assertUnlocked(trx, submissionId);
    const taken = new Set(
      (
        await existingSerials(
          trx,
          submissionId,
          parsed.rows.map((r) => r.serial),
        )
      ).map((s) => s.toLowerCase()),
    );
    const clashes = parsed.rows
      .filter((r) => taken.has(r.serial.toLowerCase()))
      .map((r) => ({ line: r.line, reason: `Serial ${r.serial} is already recorded for this submission.` }));
    if (clashes.length) throw csvError(clashes);
    const round = v.round ?? submission.currentRound;
    const ids = await insertSamples(
      trx,
      submissionId,
      parsed.rows.map((r) => ({
        serial: r.serial,
        weightG: r.weightG,
        round,
        receivedAt: r.receivedAt ?? v.receivedAt,
        acclimationStartedAt: r.acclimationStartedAt,
        notes: r.notes,
      })),
    );
    await recordChange(trx, actor, {
      action: "sample.imported",
      entity: "submission",
      entityId: submissionId,
      after: { round, samples: parsed.rows.map((r, i) => ({ id: ids[i], serial: r.serial, weightG: r.weightG })) },
    });
    return { created: ids.length };
  });
}

function csvError(errors: CsvRowError[]): AppError {
  const fields = Object.fromEntries(errors.map((e) => [`line ${e.line}`, e.reason]));
  const n = errors.length;
  return new AppError("validation", `${n} row${n === 1 ? "" : "s"} of the CSV ${n === 1 ? "needs" : "need"} correcting; nothing was saved.`, {
    fields,
    details: errors,
  });
}

export async function updateSample(actor: Actor, id: string, v: Values<typeof sampleUpdateSchema>): Promise<SampleView> {
  await visibleSample(actor, id);
  assertCanEditIntake(actor);
  return db().transaction(async (trx) => {
    const before = (await findSample(trx, id))!;
    await assertUnlocked(trx, before.submissionId);
    await updateSampleRow(trx, id, {
      serial: v.serial,
      weightG: v.weight ? toGrams(v.weight.value, v.weight.unit) : undefined,
      acclimationStartedAt: v.acclimationStartedAt,
      notes: v.notes,
    });
    const after = (await findSample(trx, id))!;
    await recordChange(trx, actor, { action: "sample.updated", entity: "sample", entityId: id, before: snapshot(before), after: snapshot(after) });
    return toSampleView(after);
  });
}

/** Only a sample entered by mistake: once it has a run it is evidence and stays. */
export async function deleteSample(actor: Actor, id: string): Promise<{ deleted: true }> {
  await visibleSample(actor, id);
  assertCanEditIntake(actor);
  return db().transaction(async (trx) => {
    const before = (await findSample(trx, id))!;
    await assertUnlocked(trx, before.submissionId);
    if (before.runCount > 0) throw new AppError("conflict", `Sample ${before.serial} has ${before.runCount} run(s) recorded and cannot be deleted.`);
    await deleteSampleRow(trx, id);
    await recordChange(trx, actor, { action: "sample.deleted", entity: "sample", entityId: id, before: snapshot(before) });
    return { deleted: true as const };
  });
}

function snapshot(s: SampleRow) {
  const { runCount: _n, ...rest } = s;
  return rest;
}

export { visibleSample };
