import "server-only";
import { isUniqueViolation, type Db } from "../db";
import { AppError } from "../errors";
import type { Role } from "./rules";

export interface UserRow {
  id: string;
  email: string;
  name: string;
  passwordHash: string | null;
  roles: Role[];
  organisationId: string | null;
  organisationName: string | null;
  active: boolean;
  createdAt: Date;
  updatedAt: Date;
}

const columns = [
  "u.id",
  "u.email",
  "u.name",
  "u.password_hash",
  "u.roles",
  "u.organisation_id",
  "o.name as organisation_name",
  "u.active",
  "u.created_at",
  "u.updated_at",
];

function toUser(r: Record<string, unknown>): UserRow {
  return {
    id: r.id as string,
    email: r.email as string,
    name: r.name as string,
    passwordHash: (r.password_hash as string | null) ?? null,
    roles: r.roles as Role[],
    organisationId: (r.organisation_id as string | null) ?? null,
    organisationName: (r.organisation_name as string | null) ?? null,
    active: r.active as boolean,
    createdAt: r.created_at as Date,
    updatedAt: r.updated_at as Date,
  };
}

function base(q: Db) {
  return q("users as u").leftJoin("organisations as o", "o.id", "u.organisation_id").select(columns);
}

export async function findUserById(q: Db, id: string): Promise<UserRow | undefined> {
  const r = await base(q).where("u.id", id).first();
  return r ? toUser(r) : undefined;
}

export async function findUserByEmail(q: Db, email: string): Promise<UserRow | undefined> {
  const r = await base(q).where("u.email", email.toLowerCase()).first();
  return r ? toUser(r) : undefined;
}

export async function listUsers(q: Db): Promise<UserRow[]> {
  const rows = await base(q).orderBy([{ column: "u.active", order: "desc" }, { column: "u.name" }]);
  return rows.map(toUser);
}

export async function insertUser(
  q: Db,
  u: { email: string; name: string; roles: Role[]; organisationId: string | null; passwordHash?: string | null },
): Promise<string> {
  try {
    const [row] = await q("users")
      .insert({ email: u.email, name: u.name, roles: u.roles, organisation_id: u.organisationId, password_hash: u.passwordHash ?? null })
      .returning("id");
    return row.id as string;
  } catch (err) {
    if (isUniqueViolation(err))
      throw new AppError("conflict", `A user with the e-mail ${u.email} already exists.`, { fields: { email: "This e-mail is already in use." } });
    throw err;
  }
}

export async function updateUserRow(q: Db, id: string, patch: { name?: string; roles?: Role[]; active?: boolean; passwordHash?: string }): Promise<void> {
  const row: Record<string, unknown> = { updated_at: q.fn.now() };
  if (patch.name !== undefined) row.name = patch.name;
  if (patch.roles !== undefined) row.roles = patch.roles;
  if (patch.active !== undefined) row.active = patch.active;
  if (patch.passwordHash !== undefined) row.password_hash = patch.passwordHash;
  await q("users").where({ id }).update(row);
}

/** Locks the row for the rest of the transaction, so two leads' edits do not interleave. */
export async function lockUser(q: Db, id: string): Promise<void> {
  await q("users").where({ id }).forUpdate().select("id");
}
