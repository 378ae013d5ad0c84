"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { fetchJson } from "@/lib/http/client";
import type { RunInput } from "@/lib/runs/schema";
import type { RunView } from "@/lib/runs/view";
import { SUBMISSIONS } from "@/lib/submissions/hooks";

/** `lockedReason`: why no change can be made while the submission is signed off (null while it can). */
export type RunDetail = RunView & { submissionId: string; sampleSerial: string; lockedReason: string | null };

const runKey = (id: string) => ["runs", id] as const;

export function useRun(id: string) {
  return useQuery({ queryKey: runKey(id), queryFn: () => fetchJson<{ run: RunDetail }>(`/api/runs/${id}`).then((r) => r.run) });
}

export function useRecordRun(sampleId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: RunInput) => fetchJson<{ run: RunDetail }>(`/api/samples/${sampleId}/runs`, { method: "POST", body: input }).then((r) => r.run),
    onSuccess: () => qc.invalidateQueries({ queryKey: SUBMISSIONS }),
  });
}

/** After a change the answer is the whole run again, so the cache takes it as it is. */
function useRunChange<T>(id: string, send: (input: T) => Promise<{ run: RunDetail }>) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: T) => send(input).then((r) => r.run),
    onSuccess: (run) => {
      qc.setQueryData(runKey(id), run);
      void qc.invalidateQueries({ queryKey: SUBMISSIONS });
    },
  });
}

export function useUpdateRun(id: string) {
  return useRunChange(id, (input: RunInput) => fetchJson(`/api/runs/${id}`, { method: "PUT", body: input }));
}

export function useAcceptRun(id: string) {
  return useRunChange(id, (reason: string) => fetchJson(`/api/runs/${id}/acceptance`, { method: "POST", body: { reason } }));
}

export function useVoidRun(id: string) {
  return useRunChange(id, (reason: string) => fetchJson(`/api/runs/${id}/void`, { method: "POST", body: { reason } }));
}
