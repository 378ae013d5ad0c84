import "server-only";
import type { Actor } from "../auth/actor";
import type { Db } from "../db";
import { insertAuditEvent } from "./queries";

/** Writes one audit event inside the caller's transaction, so the change and its record land together. */
export async function recordChange(
  q: Db,
  actor: Actor | null,
  e: { action: string; entity: string; entityId: string | null; before?: unknown; after?: unknown },
): Promise<void> {
  await insertAuditEvent(q, { actorId: actor?.id ?? null, requestId: actor?.requestId ?? null, ...e });
}
