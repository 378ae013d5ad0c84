"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { fetchJson } from "@/lib/http/client";
import type { ReopenInput, SignInput } from "@/lib/signoff/schema";
import type { SignOffView } from "@/lib/signoff/service";
import { SUBMISSIONS } from "@/lib/submissions/hooks";

export type { SignOffView };
export type SignatureView = SignOffView["signatures"][number];

const signOffKey = (id: string) => ["signoff", id] as const;

export function useSignOff(submissionId: string) {
  return useQuery({
    queryKey: signOffKey(submissionId),
    queryFn: () => fetchJson<{ signOff: SignOffView }>(`/api/submissions/${submissionId}/signoff`).then((r) => r.signOff),
  });
}

// Signing and re-opening change the submission's status and its drops' states: what shows them is asked again.
function useSignOffChange<T>(submissionId: string, path: "signoff" | "reopen") {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: T) =>
      fetchJson<{ signOff: SignOffView }>(`/api/submissions/${submissionId}/${path}`, { method: "POST", body: input }).then((r) => r.signOff),
    onSuccess: (view) => {
      qc.setQueryData(signOffKey(submissionId), view);
      void qc.invalidateQueries({ queryKey: ["results", submissionId] });
      void qc.invalidateQueries({ queryKey: SUBMISSIONS });
    },
  });
}

export const useSignResults = (submissionId: string) => useSignOffChange<SignInput>(submissionId, "signoff");
export const useReopen = (submissionId: string) => useSignOffChange<ReopenInput>(submissionId, "reopen");
