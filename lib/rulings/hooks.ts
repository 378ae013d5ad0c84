"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { fetchJson } from "@/lib/http/client";
import type { RulingInput } from "@/lib/rulings/schema";
import type { RulingView } from "@/lib/rulings/view";
import { DROPS } from "@/lib/drops/hooks";

export type { RulingView };
const rulingKey = (dropId: string) => [...DROPS, "ruling", dropId] as const;

export function useRuling(dropId: string) {
  return useQuery({
    queryKey: rulingKey(dropId),
    queryFn: () => fetchJson<{ ruling: RulingView | null }>(`/api/drops/${dropId}/ruling`).then((r) => r.ruling),
  });
}

export function useRuleDrop(dropId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: RulingInput) => fetchJson<{ ruling: RulingView }>(`/api/drops/${dropId}/ruling`, { method: "POST", body: input }).then((r) => r.ruling),
    onSuccess: (ruling) => {
      qc.setQueryData(rulingKey(dropId), ruling);
      void qc.invalidateQueries({ queryKey: DROPS });
    },
  });
}
