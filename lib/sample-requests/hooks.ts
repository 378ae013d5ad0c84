"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { fetchJson } from "@/lib/http/client";
import type { SampleRequest } from "@/lib/sample-requests/view";
import type { AcknowledgeInput, SampleRequestInput } from "@/lib/sample-requests/schema";
import { SUBMISSIONS } from "@/lib/submissions/hooks";

export type { SampleRequest };

const key = (submissionId: string) => ["sample-requests", submissionId] as const;

export function useSampleRequests(submissionId: string) {
  return useQuery({
    queryKey: key(submissionId),
    queryFn: () => fetchJson<{ requests: SampleRequest[] }>(`/api/submissions/${submissionId}/sample-requests`).then((r) => r.requests),
  });
}

export function useRequestSamples(submissionId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: SampleRequestInput) =>
      fetchJson<{ request: SampleRequest }>(`/api/submissions/${submissionId}/sample-requests`, { method: "POST", body }),
    onSuccess: () => Promise.all([qc.invalidateQueries({ queryKey: key(submissionId) }), qc.invalidateQueries({ queryKey: SUBMISSIONS })]),
  });
}

export function useAcknowledgeRequest(submissionId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ id, ...body }: AcknowledgeInput & { id: string }) =>
      fetchJson<{ request: SampleRequest }>(`/api/sample-requests/${id}/acknowledge`, { method: "POST", body }),
    onSuccess: () => qc.invalidateQueries({ queryKey: key(submissionId) }),
  });
}

/** The staged decision's next round, to prefill the request form (staff only). */
export function useNextRound(submissionId: string) {
  return useQuery({
    queryKey: ["results", submissionId, "next-round"],
    queryFn: () =>
      fetchJson<{ decision: { nextRound: { round: number; size: number } | null } }>(`/api/submissions/${submissionId}/results`).then(
        (r) => r.decision?.nextRound ?? null,
      ),
  });
}
