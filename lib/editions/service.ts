import "server-only";
import type { Actor } from "../auth/actor";
import { recordChange } from "../audit/record";
import { db } from "../db";
import { AppError } from "../errors";
import { assertLead, assertStaff } from "../submissions/policy";
import { findEdition, insertEdition, listEditions as selectEditions, submissionsUsingEdition, updateEdition as writeEdition, type EditionRow } from "./queries";
import type { EditionValues } from "./schema";

export type { EditionRow };

export async function listEditions(actor: Actor): Promise<EditionRow[]> {
  assertStaff(actor, "edition");
  return selectEditions(db());
}

export async function getEdition(actor: Actor, id: string): Promise<EditionRow & { usedBy: { id: string; reference: string; modelName: string }[] }> {
  assertStaff(actor, "edition");
  const edition = await findEdition(db(), id);
  if (!edition) throw new AppError("not_found", "No such edition.");
  return { ...edition, usedBy: await submissionsUsingEdition(db(), id) };
}

/** A new edition; `basedOnId` records which older edition it was made from. */
export async function createEdition(actor: Actor, values: EditionValues): Promise<EditionRow> {
  assertLead(actor, "create specification editions");
  return db().transaction(async (trx) => {
    if (values.basedOnId && !(await findEdition(trx, values.basedOnId))) {
      throw new AppError("validation", "The edition it is based on does not exist.", { fields: { basedOnId: "Unknown edition." } });
    }
    const id = await insertEdition(trx, values, actor.id);
    const created = (await findEdition(trx, id))!;
    await recordChange(trx, actor, { action: "edition.created", entity: "specification_edition", entityId: id, after: snapshot(created) });
    return created;
  });
}

/** Only while no submission uses it; the database refuses otherwise, and we say so in words. */
export async function updateEdition(actor: Actor, id: string, values: EditionValues): Promise<EditionRow> {
  assertLead(actor, "change specification editions");
  return db().transaction(async (trx) => {
    const before = await findEdition(trx, id);
    if (!before) throw new AppError("not_found", "No such edition.");
    if (before.submissionCount > 0) {
      throw new AppError(
        "conflict",
        `This edition is used by ${before.submissionCount} submission(s) and cannot be changed. Create a new edition from it instead.`,
      );
    }
    await writeEdition(trx, id, { ...values, basedOnId: before.basedOnId });
    const after = (await findEdition(trx, id))!;
    await recordChange(trx, actor, {
      action: "edition.updated",
      entity: "specification_edition",
      entityId: id,
      before: snapshot(before),
      after: snapshot(after),
    });
    return after;
  });
}

function snapshot(e: EditionRow) {
  const { submissionCount: _count, createdAt: _created, ...rest } = e;
  return rest;
}
