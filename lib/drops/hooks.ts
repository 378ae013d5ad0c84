"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { fetchJson } from "@/lib/http/client";
import type { MarksInput, PlacementInput } from "@/lib/readings/schema";
import type { DropView, QueueItem, ReadingView } from "@/lib/readings/view";

export type { DropView, QueueItem, ReadingView };

// Drops and readings. Every change answers with the whole drop as the caller may see it, so the
// cache takes that answer as it is and the lists are asked again.
export const DROPS = ["drops"] as const;
const dropKey = (id: string) => [...DROPS, "one", id] as const;
const runDropsKey = (runId: string) => [...DROPS, "run", runId] as const;
const QUEUE = [...DROPS, "queue"] as const;
const DISCREPANCIES = [...DROPS, "discrepancies"] as const;

export function useDrop(id: string) {
  return useQuery({ queryKey: dropKey(id), queryFn: () => fetchJson<{ drop: DropView }>(`/api/drops/${id}`).then((r) => r.drop) });
}

export function useRunDrops(runId: string) {
  return useQuery({ queryKey: runDropsKey(runId), queryFn: () => fetchJson<{ drops: DropView[] }>(`/api/runs/${runId}/drops`).then((r) => r.drops) });
}

export function useWorkQueue() {
  return useQuery({ queryKey: QUEUE, queryFn: () => fetchJson<{ items: QueueItem[] }>("/api/work-queue").then((r) => r.items), refetchInterval: 30_000 });
}

export function useDiscrepancies() {
  return useQuery({ queryKey: DISCREPANCIES, queryFn: () => fetchJson<{ drops: DropView[] }>("/api/discrepancies").then((r) => r.drops) });
}

function useDropChange<T>(send: (input: T) => Promise<{ drop: DropView }>) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: T) => send(input).then((r) => r.drop),
    onSuccess: (drop) => {
      qc.setQueryData(dropKey(drop.id), drop);
      void qc.invalidateQueries({ queryKey: runDropsKey(drop.runId) });
      void qc.invalidateQueries({ queryKey: QUEUE });
      void qc.invalidateQueries({ queryKey: DISCREPANCIES });
    },
  });
}

export function usePlaceDrop(dropId: string) {
  return useDropChange((p: PlacementInput) => fetchJson(`/api/drops/${dropId}/placement`, { method: "PUT", body: p }));
}

/** Starts the caller's reading with these marks, or updates the draft already started. */
export function useSaveMarks(dropId: string, draftId: string | null) {
  return useDropChange((m: MarksInput) =>
    draftId ? fetchJson(`/api/readings/${draftId}`, { method: "PATCH", body: m }) : fetchJson(`/api/drops/${dropId}/readings`, { method: "POST", body: m }),
  );
}

export function useSubmitReading() {
  return useDropChange((readingId: string) => fetchJson(`/api/readings/${readingId}/submit`, { method: "POST", body: {} }));
}

export function useDiscardDraft() {
  return useDropChange((readingId: string) => fetchJson(`/api/readings/${readingId}`, { method: "DELETE" }));
}

export function useStartCorrection() {
  return useDropChange((v: { readingId: string; reason: string }) =>
    fetchJson(`/api/readings/${v.readingId}/corrections`, { method: "POST", body: { reason: v.reason } }),
  );
}
