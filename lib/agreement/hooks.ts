"use client";

import { keepPreviousData, useQuery } from "@tanstack/react-query";
import { fetchJson } from "@/lib/http/client";
import type { AgreementReport } from "@/lib/agreement/rules";

export type { AgreementReport };

export interface AgreementRange {
  from?: string;
  to?: string;
}

/** The reviewers' agreement over a period; an empty end takes the server's default (the last 90 days). */
export function useAgreement(range: AgreementRange) {
  const qs = new URLSearchParams();
  if (range.from) qs.set("from", range.from);
  if (range.to) qs.set("to", range.to);
  return useQuery({
    queryKey: ["agreement", range.from ?? "", range.to ?? ""],
    queryFn: () => fetchJson<{ agreement: AgreementReport }>(`/api/agreement?${qs}`).then((r) => r.agreement),
    placeholderData: keepPreviousData,
    retry: (count, err) => (err as { status?: number }).status !== 422 && count < 2,
  });
}
