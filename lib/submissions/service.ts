import "server-only";
import type { Actor } from "../auth/actor";
import { recordChange } from "../audit/record";
import { db } from "../db";
import { findEdition, findEditionInForce } from "../editions/queries";
import { lockStatus } from "../signoff/lock";
import { AppError } from "../errors";
import { findOrganisation } from "../organisations/queries";
import { conditionFlags } from "../runs/conditions";
import { findRunConditions, listRunsOfSubmission } from "../runs/queries";
import { toRunView } from "../runs/view";
import { listSamples } from "../samples/queries";
import { toSampleView } from "../samples/view";
import { isStaff } from "../users/rules";
import { assertCanEditIntake, assertVisible } from "./policy";
import {
  findSubmission,
  insertSubmission,
  listSubmissions as selectSubmissions,
  lockSubmission,
  nextReference,
  updateSubmissionRow,
  type SubmissionRow,
} from "./queries";
import type { SubmissionListQuery, SubmissionValues, submissionUpdateSchema } from "./schema";
import { toManufacturerView, toSubmissionView, type ManufacturerSubmissionView, type StaffSubmissionDetail, type SubmissionView } from "./view";
import type { z } from "zod";

/** Loads a submission the actor may see, or answers "not found" exactly as for a missing one. */
export async function visibleSubmission(actor: Actor, id: string, q = db()): Promise<SubmissionRow> {
  const s = await findSubmission(q, id);
  if (!s) throw new AppError("not_found", "No such submission.");
  assertVisible(actor, s.organisationId, "submission");
  return s;
}

export async function createSubmission(actor: Actor, v: SubmissionValues): Promise<SubmissionView> {
  assertCanEditIntake(actor);
  return db().transaction(async (trx) => {
    if (!(await findOrganisation(trx, v.organisationId)))
      throw new AppError("validation", "That organisation does not exist.", { fields: { organisationId: "Choose an organisation from the list." } });
    if (v.receivedOn > new Date(Date.now() + 86_400_000).toISOString().slice(0, 10)) {
      throw new AppError("validation", "The received date is in the future.", { fields: { receivedOn: "The received date cannot be in the future." } });
    }
    const edition = await findEditionInForce(trx, v.receivedOn);
    if (!edition)
      throw new AppError("validation", `No specification edition is in force on ${v.receivedOn}. A lead must create one first.`, {
        fields: { receivedOn: "No edition is in force on this date." },
      });
    if (v.kind === "surveillance") await checkApprovalLink(trx, v);
    const reference = await nextReference(trx, Number(v.receivedOn.slice(0, 4)));
    const id = await insertSubmission(trx, { ...v, reference, editionId: edition.id, createdBy: actor.id });
    const created = (await findSubmission(trx, id))!;
    await recordChange(trx, actor, { action: "submission.created", entity: "submission", entityId: id, after: snapshot(created) });
    return toSubmissionView(created);
  });
}

async function checkApprovalLink(trx: Parameters<typeof findSubmission>[0], v: SubmissionValues) {
  const approval = await findSubmission(trx, v.approvalSubmissionId!);
  const field = { approvalSubmissionId: "Choose an approval submission of the same organisation." };
  if (approval?.kind !== "approval") throw new AppError("validation", "The linked submission must be an approval submission.", { fields: field });
  if (approval.organisationId !== v.organisationId)
    throw new AppError("validation", "The linked approval submission belongs to another organisation.", { fields: field });
}

/** A page of submissions; for staff each row counts its runs with unaccepted condition warnings. */
export async function listSubmissions(
  actor: Actor,
  f: SubmissionListQuery,
): Promise<{ rows: (SubmissionView & { flaggedRuns: number })[]; total: number; page: number; pageSize: number }> {
  // A manufacturer's list is its own organisation's, whatever filter it sends.
  const scope = isStaff(actor) ? {} : { organisationId: actor.organisationId ?? "00000000-0000-0000-0000-000000000000" };
  const { rows, total } = await selectSubmissions(db(), f, scope);
  const flagged = new Map<string, number>();
  if (isStaff(actor)) {
    for (const r of await findRunConditions(
      db(),
      rows.map((x) => x.id),
    )) {
      if (!r.accepted && conditionFlags(r.limits, r.input).length > 0) flagged.set(r.submissionId, (flagged.get(r.submissionId) ?? 0) + 1);
    }
  }
  return { rows: rows.map((r) => ({ ...toSubmissionView(r), flaggedRuns: flagged.get(r.id) ?? 0 })), total, page: f.page, pageSize: f.pageSize };
}

export async function getSubmission(actor: Actor, id: string): Promise<StaffSubmissionDetail | ({ view: "manufacturer" } & ManufacturerSubmissionView)> {
  const s = await visibleSubmission(actor, id);
  const samples = await listSamples(db(), id);
  if (!isStaff(actor)) return { view: "manufacturer", ...toManufacturerView(s, samples) };
  const edition = (await findEdition(db(), s.editionId))!;
  const runs = await listRunsOfSubmission(db(), id);
  const rounds = new Map<number, StaffSubmissionDetail["rounds"][number]["samples"]>();
  for (const sample of samples) {
    const list = rounds.get(sample.round) ?? [];
    list.push({ ...toSampleView(sample), runs: runs.filter((r) => r.sampleId === sample.id).map((r) => toRunView(r, sample, edition)) });
    rounds.set(sample.round, list);
  }
  const grouped = [...rounds].sort((a, b) => a[0] - b[0]).map(([round, list]) => ({ round, samples: list }));
  return {
    view: "staff",
    submission: toSubmissionView(s),
    edition: {
      id: edition.id,
      name: edition.name,
      dropsPerBall: edition.dropsPerBall,
      minAbsorptionS: edition.minAbsorptionS,
      belowMinimumRule: edition.belowMinimumRule,
      minAcclimationH: edition.minAcclimationH,
      surfaceTempMinC: edition.surfaceTempMinC,
      surfaceTempMaxC: edition.surfaceTempMaxC,
      roughnessMaxSdUm: edition.roughnessMaxSdUm,
    },
    rounds: grouped,
    flaggedRuns: grouped.flatMap((g) => g.samples.flatMap((x) => x.runs)).filter((r) => r.needsAcceptance).length,
    signOff: await lockStatus(db(), id),
  };
}

export async function updateSubmission(actor: Actor, id: string, patch: z.output<typeof submissionUpdateSchema>): Promise<SubmissionView> {
  return db().transaction(async (trx) => {
    await visibleSubmission(actor, id, trx);
    assertCanEditIntake(actor);
    await lockSubmission(trx, id);
    const before = (await findSubmission(trx, id))!;
    await updateSubmissionRow(trx, id, patch);
    const after = (await findSubmission(trx, id))!;
    await recordChange(trx, actor, { action: "submission.updated", entity: "submission", entityId: id, before: snapshot(before), after: snapshot(after) });
    return toSubmissionView(after);
  });
}

function snapshot(s: SubmissionRow) {
  const { sampleCount: _n, createdAt: _c, organisationName: _o, editionName: _e, approvalReference: _a, ...rest } = s;
  return rest;
}
