import "server-only";
import type { Db } from "../db";

export interface AuditEventInput {
  actorId: string | null;
  action: string;
  entity: string;
  entityId: string | null;
  before?: unknown;
  after?: unknown;
  requestId: string | null;
}

export interface AuditEventRow extends AuditEventInput {
  id: string;
  at: Date;
}

export async function insertAuditEvent(q: Db, e: AuditEventInput): Promise<void> {
  await q("audit_events").insert({
    actor_id: e.actorId,
    action: e.action,
    entity: e.entity,
    entity_id: e.entityId,
    before: e.before === undefined ? null : JSON.stringify(e.before),
    after: e.after === undefined ? null : JSON.stringify(e.after),
    request_id: e.requestId,
  });
}

export async function findAuditEvents(q: Db, filter: { entity?: string; entityId?: string; action?: string; limit?: number }): Promise<AuditEventRow[]> {
  const query = q("audit_events")
    .orderBy("id", "desc")
    .limit(filter.limit ?? 100);
  if (filter.entity) query.where("entity", filter.entity);
  if (filter.entityId) query.where("entity_id", filter.entityId);
  if (filter.action) query.where("action", filter.action);
  const rows = await query;
  return rows.map((r) => ({
    id: String(r.id),
    actorId: r.actor_id,
    action: r.action,
    entity: r.entity,
    entityId: r.entity_id,
    before: r.before,
    after: r.after,
    requestId: r.request_id,
    at: r.at,
  }));
}
