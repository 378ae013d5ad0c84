"use client";

import { keepPreviousData, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { fetchJson } from "@/lib/http/client";
import type { SampleInput } from "@/lib/samples/schema";
import type { SampleView } from "@/lib/samples/view";
import type { SubmissionInput } from "@/lib/submissions/schema";
import type { ManufacturerSubmissionView, StaffSubmissionDetail, SubmissionView } from "@/lib/submissions/view";

/** Staff rows also count the runs whose condition warnings no lead has accepted yet. */
export type SubmissionRow = SubmissionView & { flaggedRuns?: number };

export interface SubmissionPage {
  rows: SubmissionRow[];
  total: number;
  page: number;
  pageSize: number;
}

export type SubmissionDetail = StaffSubmissionDetail | ({ view: "manufacturer" } & ManufacturerSubmissionView);

export const SUBMISSIONS = ["submissions"] as const;

/** One page of the list; the previous page stays on screen while the next one loads. */
export function useSubmissionPage(search: string, enabled = true) {
  return useQuery({
    queryKey: [...SUBMISSIONS, "list", search],
    queryFn: () => fetchJson<SubmissionPage>(`/api/submissions?${search}`),
    placeholderData: keepPreviousData,
    enabled,
  });
}

export function useSubmission(id: string) {
  return useQuery({ queryKey: [...SUBMISSIONS, "one", id], queryFn: () => fetchJson<SubmissionDetail>(`/api/submissions/${id}`) });
}

export function useCreateSubmission() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: SubmissionInput) => fetchJson<{ submission: SubmissionView }>("/api/submissions", { method: "POST", body: input }),
    onSuccess: () => qc.invalidateQueries({ queryKey: SUBMISSIONS }),
  });
}

export interface SampleImport {
  csv: string;
  unit: "g" | "oz" | "lb";
  round?: number;
  receivedAt: string;
}

export function useAddSample(submissionId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: SampleInput) => fetchJson<{ sample: SampleView }>(`/api/submissions/${submissionId}/samples`, { method: "POST", body: input }),
    onSuccess: () => qc.invalidateQueries({ queryKey: SUBMISSIONS }),
  });
}

export function useImportSamples(submissionId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: SampleImport) => fetchJson<{ created: number }>(`/api/submissions/${submissionId}/samples/import`, { method: "POST", body: input }),
    onSuccess: () => qc.invalidateQueries({ queryKey: SUBMISSIONS }),
  });
}
