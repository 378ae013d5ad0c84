// The audit page's filters and their query string: plain code, shared by the page (server) and the list (browser).

import type { AuditQuery } from "@/lib/audit/schema";

/** The audit API's filters as the address carries them: text, blanks left out. */
export type AuditFilters = { [K in keyof AuditQuery]?: string };

export const FILTER_KEYS = ["actorId", "action", "entity", "entityId", "from", "to", "page", "pageSize"] as const satisfies readonly (keyof AuditQuery)[];

export function auditSearch(f: AuditFilters): string {
  const out = new URLSearchParams();
  for (const k of FILTER_KEYS) {
    const v = f[k]?.trim();
    if (v) out.set(k, v);
  }
  return out.toString();
}
