import type { Db } from "../db";

export interface OrganisationRow {
  id: string;
  name: string;
}

export async function listOrganisations(q: Db): Promise<OrganisationRow[]> {
  return q("organisations").select("id", "name").orderBy("name");
}

export async function findOrganisation(q: Db, id: string): Promise<OrganisationRow | undefined> {
  return q("organisations").where({ id }).first("id", "name");
}
