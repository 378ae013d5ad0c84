import "server-only";
import type { Db } from "../db";

// The audit page's query: events with who did them, filtered and paged, newest first, each with the
// state of the drop it concerns (when it concerns one) so the blind rule can be applied.

export interface AuditFilter {
  actorId?: string;
  action?: string;
  entity?: string;
  entityId?: string;
  from?: string;
  to?: string;
  page: number;
  pageSize: number;
}

export interface AuditListRow {
  id: string;
  at: Date;
  actorId: string | null;
  actorName: string | null;
  action: string;
  entity: string;
  entityId: string | null;
  before: unknown;
  after: unknown;
  requestId: string | null;
  /** The state of the drop a reading or drop event concerns; null for other events. */
  dropState: string | null;
}

// A reading's drop: from the reading row, or from the event itself (a discarded draft is gone).
const DROP_OF_EVENT = `coalesce(
  case when e.entity = 'drop' then e.entity_id end,
  (select g.drop_id::text from readings g where e.entity = 'reading' and g.id::text = e.entity_id),
  case when e.entity = 'reading' then coalesce(e.after->>'dropId', e.before->>'dropId') end)`;

export async function listAuditEvents(q: Db, f: AuditFilter): Promise<{ rows: AuditListRow[]; total: number }> {
  const base = q("audit_events as e").leftJoin("users as u", "u.id", "e.actor_id");
  if (f.actorId) base.where("e.actor_id", f.actorId);
  if (f.action) base.where("e.action", "like", `${f.action.replace(/[%_\\]/g, "\\$&")}%`);
  if (f.entity) base.where("e.entity", f.entity);
  if (f.entityId) base.where("e.entity_id", f.entityId);
  if (f.from) base.where("e.at", ">=", f.from);
  if (f.to) base.whereRaw("e.at < (?::date + 1)", [f.to]);
  const [{ count }] = await base.clone().count<{ count: string }[]>("* as count");
  const rows = await base
    .select("e.*", "u.name as actor_name", q.raw(`(select d.state from drops d where d.id::text = ${DROP_OF_EVENT}) as drop_state`))
    .orderBy("e.id", "desc")
    .limit(f.pageSize)
    .offset((f.page - 1) * f.pageSize);
  return {
    total: Number(count),
    rows: rows.map((r: Record<string, any>) => ({
      id: String(r.id),
      at: r.at,
      actorId: r.actor_id,
      actorName: r.actor_name,
      action: r.action,
      entity: r.entity,
      entityId: r.entity_id,
      before: r.before,
      after: r.after,
      requestId: r.request_id,
      dropState: r.drop_state,
    })),
  };
}
