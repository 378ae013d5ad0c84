import "server-only";
import { isUniqueViolation, type Db } from "../db";
import { AppError } from "../errors";

export interface OrganisationRow {
  id: string;
  name: string;
  contactEmails: string[];
}

const columns = ["id", "name", "contact_emails as contactEmails"];

export async function listOrganisations(q: Db): Promise<OrganisationRow[]> {
  return q("organisations").select(columns).orderBy("name");
}

export async function findOrganisation(q: Db, id: string): Promise<OrganisationRow | undefined> {
  return q("organisations").where({ id }).first(columns);
}

function duplicate(err: unknown, name: string): never {
  if (isUniqueViolation(err))
    throw new AppError("conflict", `An organisation named ${name} already exists.`, { fields: { name: "This name is already used." } });
  throw err;
}

export async function insertOrganisation(q: Db, o: { name: string; contactEmails: string[] }): Promise<string> {
  try {
    const [row] = await q("organisations").insert({ name: o.name, contact_emails: o.contactEmails }).returning("id");
    return row.id;
  } catch (err) {
    duplicate(err, o.name);
  }
}

export async function updateOrganisationRow(q: Db, id: string, o: { name?: string; contactEmails?: string[] }): Promise<void> {
  const row: Record<string, unknown> = {};
  if (o.name !== undefined) row.name = o.name;
  if (o.contactEmails !== undefined) row.contact_emails = o.contactEmails;
  if (Object.keys(row).length === 0) return;
  try {
    await q("organisations").where({ id }).update(row);
  } catch (err) {
    duplicate(err, o.name ?? "");
  }
}
