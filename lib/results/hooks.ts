"use client";

import { useQuery } from "@tanstack/react-query";
import { fetchJson } from "@/lib/http/client";
import type { ResultsView } from "@/lib/results/view";
import { judgedThresholds, secsAgainst } from "@/lib/results/words";

export type { ResultsView };
export type BallResultView = ResultsView["balls"][number];

// Results are computed by the server from settled drops on every request; a reading anywhere may
// change them, so they are asked again whenever the page comes back into view.
export function useSubmissionResults(id: string) {
  return useQuery({ queryKey: ["results", id], queryFn: () => fetchJson<ResultsView>(`/api/submissions/${id}/results`), refetchOnWindowFocus: true });
}

/** Seconds to three decimals, as drop times are read. */
export const s3 = (v: number | null) => (v === null ? "—" : `${v.toFixed(3)} s`);
/** Seconds to one decimal, as ball results are reported. */
export const s1 = (v: number | null) => (v === null ? "—" : `${v.toFixed(1)} s`);
/** A judged value: `min` decimals, more where fewer would put it on or across the minimum or the guard band's top. */
export const sJudged = (v: number | null, edition: { minAbsorptionS: number; guardBandS: number }, min = 1) =>
  v === null ? "—" : secsAgainst(v, judgedThresholds(edition), min);
