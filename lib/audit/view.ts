import { isBeingRead } from "../drops/states";
import type { Actor } from "../auth/actor";
import { hasRole } from "../users/rules";
import type { AuditListRow } from "./list-queries";

// What a lead sees of an audit event. Pure. Blind rule: while a drop is still being read (unread or
// read once), events carrying a reading's marks, or the drop's state, stay hidden from anyone who
// holds the reviewer role: they could tell one reader what the other marked.

export const HIDDEN = "hidden until both readings are in";

export interface AuditEventView {
  id: string;
  at: string;
  actor: { id: string; name: string } | null;
  action: string;
  entity: string;
  entityId: string | null;
  before: unknown;
  after: unknown;
  requestId: string | null;
  hidden: string | null;
}

export function isHiddenFor(actor: Actor, e: Pick<AuditListRow, "entity" | "dropState">): boolean {
  return hasRole(actor, "reviewer") && (e.entity === "reading" || e.entity === "drop") && isBeingRead(e.dropState);
}

export function toAuditEventView(actor: Actor, e: AuditListRow): AuditEventView {
  const hidden = isHiddenFor(actor, e);
  return {
    id: e.id,
    at: e.at.toISOString(),
    actor: e.actorId ? { id: e.actorId, name: e.actorName ?? "" } : null,
    action: e.action,
    entity: e.entity,
    entityId: e.entityId,
    before: hidden ? null : e.before,
    after: hidden ? null : e.after,
    requestId: e.requestId,
    hidden: hidden ? HIDDEN : null,
  };
}
