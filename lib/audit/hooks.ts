"use client";

import { keepPreviousData, useQuery } from "@tanstack/react-query";
import { fetchJson } from "@/lib/http/client";
import type { AuditEventView } from "@/lib/audit/view";
import type { UserView } from "@/lib/users/view";
import { auditSearch, type AuditFilters } from "@/lib/audit/filters";

export type { AuditEventView, AuditFilters };
export { auditSearch };

export interface AuditPage {
  events: AuditEventView[];
  total: number;
  page: number;
  pageSize: number;
}

export function useAudit(f: AuditFilters) {
  const search = auditSearch(f);
  return useQuery({ queryKey: ["audit", search], queryFn: () => fetchJson<AuditPage>(`/api/audit?${search}`), placeholderData: keepPreviousData });
}

/** Everyone who can appear as the one who did something, for the "who" filter. */
export function useAuditPeople() {
  return useQuery({ queryKey: ["users"], queryFn: () => fetchJson<{ users: UserView[] }>("/api/users").then((r) => r.users) });
}
