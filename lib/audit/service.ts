import "server-only";
import type { Actor } from "../auth/actor";
import { db } from "../db";
import { assertLead } from "../submissions/policy";
import { listAuditEvents } from "./list-queries";
import type { AuditQuery } from "./schema";
import { toAuditEventView, type AuditEventView } from "./view";

/** The audit log for a lead, filtered and paged; the blind rule applies to leads who also read. */
export async function listAudit(actor: Actor, f: AuditQuery): Promise<{ events: AuditEventView[]; total: number; page: number; pageSize: number }> {
  assertLead(actor, "see the audit log");
  const { rows, total } = await listAuditEvents(db(), f);
  return { events: rows.map((r) => toAuditEventView(actor, r)), total, page: f.page, pageSize: f.pageSize };
}
