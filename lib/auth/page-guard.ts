import "server-only";
import { headers } from "next/headers";
import { redirect } from "next/navigation";
import { hasAnyRole, isStaff, type Role } from "../users/rules";
import type { Actor } from "./actor";
import { RETURN_TO_HEADER, signInPath } from "./return-to";
import { currentActor } from "./session";

/** Where a signed-in person starts: lab staff at the overview, manufacturers in their portal. */
export function homeFor(actor: Actor): string {
  return isStaff(actor) ? "/overview" : "/portal";
}

/**
 * For server components: the actor, or a redirect to sign-in. With `roles`, someone signed in
 * without one of them is sent to their own start page instead of seeing a page they cannot use.
 * Sign-in remembers the page (passed on by the proxy), so an expired session returns there too.
 */
export async function requirePageActor(roles?: readonly Role[]): Promise<Actor> {
  const actor = await currentActor();
  if (!actor) redirect(signInPath((await headers()).get(RETURN_TO_HEADER)));
  if (roles && !hasAnyRole(actor, roles)) redirect(homeFor(actor));
  return actor;
}
