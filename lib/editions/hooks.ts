"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { EditionRow } from "@/lib/editions/service";
import type { EditionInput } from "@/lib/editions/schema";
import { fetchJson } from "@/lib/http/client";

/** An edition as JSON carries its creation time as a string. */
export type EditionJson = Omit<EditionRow, "createdAt"> & { createdAt: string };
export type EditionDetail = EditionJson & { usedBy: { id: string; reference: string; modelName: string }[] };

const EDITIONS = ["editions"] as const;

export function useEditions() {
  return useQuery({ queryKey: EDITIONS, queryFn: () => fetchJson<{ editions: EditionJson[] }>("/api/editions").then((r) => r.editions) });
}

export function useEdition(id: string | null) {
  return useQuery({
    queryKey: [...EDITIONS, id],
    queryFn: () => fetchJson<{ edition: EditionDetail }>(`/api/editions/${id}`).then((r) => r.edition),
    enabled: !!id,
  });
}

export function useSaveEdition(id: string | null) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: EditionInput) =>
      fetchJson<{ edition: EditionJson }>(id ? `/api/editions/${id}` : "/api/editions", { method: id ? "PUT" : "POST", body: input }).then((r) => r.edition),
    onSuccess: () => qc.invalidateQueries({ queryKey: EDITIONS }),
  });
}
