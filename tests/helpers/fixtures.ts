import { randomBytes } from "node:crypto";
import { hashPassword } from "@/lib/auth/password";
import { db } from "@/lib/db";
import { updateOptOut } from "@/lib/notifications/queries";
import { listOrganisations } from "@/lib/organisations/queries";
import { insertUser } from "@/lib/users/queries";
import type { Role } from "@/lib/users/rules";
import { DEMO_PASSWORD, DEMO_USERS } from "@/seeds/demo";

export const PASSWORD = "correct horse battery";

export const demo = {
  password: DEMO_PASSWORD,
  email: (role: "technician" | "reviewer" | "lead" | "manufacturer") => DEMO_USERS.find((u) => u.roles[0] === role)!.email,
};

export const uniqueEmail = (tag: string) => `${tag}-${randomBytes(4).toString("hex")}@example.test`;

/** A ready account, created through the data layer (the invite flow has its own test). */
export async function makeUser(
  roles: Role[],
  opts: { organisationId?: string; password?: string; invited?: boolean; name?: string; optOut?: string[] } = {},
): Promise<{ id: string; email: string; password: string; name: string }> {
  const email = uniqueEmail(roles.join("-"));
  const name = opts.name ?? `Test ${roles.join(" ")}`;
  const password = opts.password ?? PASSWORD;
  const passwordHash = opts.invited ? null : await hashPassword(password);
  // Optional notices switched off in the same transaction, so the worker's digest never sees the
  // account with them on.
  const id = await db().transaction(async (trx) => {
    const created = await insertUser(trx, { email, name, roles, organisationId: opts.organisationId ?? null, passwordHash });
    if (opts.optOut?.length) await updateOptOut(trx, created, opts.optOut);
    return created;
  });
  return { id, email, password, name };
}

export async function demoOrganisationId(): Promise<string> {
  return (await listOrganisations(db()))[0].id;
}
