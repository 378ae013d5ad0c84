import "server-only";
import type { z } from "zod";
import type { Actor } from "../auth/actor";
import { recordChange } from "../audit/record";
import { db } from "../db";
import { AppError } from "../errors";
import { assertLead, assertStaff } from "../submissions/policy";
import { findOrganisation, insertOrganisation, listOrganisations as selectOrganisations, updateOrganisationRow, type OrganisationRow } from "./queries";
import type { organisationInputSchema, organisationUpdateSchema } from "./schema";

export type { OrganisationRow };

/** Manufacturers, for staff: intake forms, filters and manufacturer accounts. */
export async function listOrganisations(actor: Actor): Promise<OrganisationRow[]> {
  assertStaff(actor, "organisation");
  return selectOrganisations(db());
}

export async function createOrganisation(actor: Actor, v: z.output<typeof organisationInputSchema>): Promise<OrganisationRow> {
  assertLead(actor, "add organisations");
  return db().transaction(async (trx) => {
    const id = await insertOrganisation(trx, v);
    const created = (await findOrganisation(trx, id))!;
    await recordChange(trx, actor, { action: "organisation.created", entity: "organisation", entityId: id, after: created });
    return created;
  });
}

export async function updateOrganisation(actor: Actor, id: string, v: z.output<typeof organisationUpdateSchema>): Promise<OrganisationRow> {
  assertLead(actor, "change organisations");
  return db().transaction(async (trx) => {
    const before = await findOrganisation(trx, id);
    if (!before) throw new AppError("not_found", "No such organisation.");
    await updateOrganisationRow(trx, id, v);
    const after = (await findOrganisation(trx, id))!;
    await recordChange(trx, actor, { action: "organisation.updated", entity: "organisation", entityId: id, before, after });
    return after;
  });
}

/** A manufacturer's own organisation; lab staff have none. */
export async function ownOrganisation(actor: Actor): Promise<OrganisationRow | null> {
  if (!actor.organisationId) return null;
  return (await findOrganisation(db(), actor.organisationId)) ?? null;
}
