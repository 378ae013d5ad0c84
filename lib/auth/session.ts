import "server-only";
import { randomUUID } from "node:crypto";
import { getServerSession } from "next-auth";
import { headers } from "next/headers";
import { db } from "../db";
import { findUserById } from "../users/queries";
import type { Actor } from "./actor";
import { authOptions } from "./options";

/**
 * The signed-in actor for this request, or null. Roles, organisation and the active flag come from
 * the database every time, so a role change or deactivation applies to the very next request.
 */
export async function currentActor(requestId?: string): Promise<Actor | null> {
  const session = await getServerSession(authOptions());
  const id = (session?.user as { id?: string } | undefined)?.id;
  if (!id) return null;
  const user = await findUserById(db(), id);
  if (!user?.active || !user.passwordHash) return null;
  const rid = requestId ?? (await headers()).get("x-request-id") ?? randomUUID();
  return { id: user.id, email: user.email, name: user.name, roles: user.roles, organisationId: user.organisationId, requestId: rid };
}
