// The audit page's filters and their query string: plain code, shared by the page (server) and the list (browser).

/** The audit page's filters as the address carries them; blanks are left out. */
export interface AuditFilters {
  actorId?: string;
  action?: string;
  entity?: string;
  entityId?: string;
  from?: string;
  to?: string;
  page?: string;
  pageSize?: string;
}

export const FILTER_KEYS = ["actorId", "action", "entity", "entityId", "from", "to", "page", "pageSize"] as const;

export function auditSearch(f: AuditFilters): string {
  const out = new URLSearchParams();
  for (const k of FILTER_KEYS) {
    const v = f[k]?.trim();
    if (v) out.set(k, v);
  }
  return out.toString();
}
