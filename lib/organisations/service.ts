import type { Actor } from "../auth/actor";
import { db } from "../db";
import { assertCanManageUsers } from "../users/policy";
export type { OrganisationRow } from "./queries";
import { findOrganisation, listOrganisations as selectOrganisations, type OrganisationRow } from "./queries";

/** The organisations a lead can attach a manufacturer account to. */
export async function listOrganisations(actor: Actor): Promise<OrganisationRow[]> {
  assertCanManageUsers(actor);
  return selectOrganisations(db());
}

/** A manufacturer's own organisation; lab staff have none. */
export async function ownOrganisation(actor: Actor): Promise<OrganisationRow | null> {
  if (!actor.organisationId) return null;
  return (await findOrganisation(db(), actor.organisationId)) ?? null;
}
