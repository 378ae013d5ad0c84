"use client";

import { useQuery, useQueryClient } from "@tanstack/react-query";
import { useCallback } from "react";
import type { ClipView } from "@/lib/clips/view";
import { fetchJson } from "@/lib/http/client";
import type { UploadState } from "@/lib/uploads/browser/multipart";

export type { ClipView };

export const CLIPS = ["clips"] as const;
const runClipsKey = (runId: string) => [...CLIPS, "run", runId] as const;
const clipKey = (id: string) => [...CLIPS, "one", id] as const;

/** Work is still going on for a clip: its page and lists look again every 1.5 s. */
export const inProgress = (status: ClipView["status"] | undefined) => status === "uploading" || status === "processing";
const POLL_MS = 1500;

/** A run's recordings; polled while one of them is being processed. */
export function useRunClips(runId: string) {
  return useQuery({
    queryKey: runClipsKey(runId),
    queryFn: () => fetchJson<{ clips: ClipView[] }>(`/api/runs/${runId}/clips`).then((r) => r.clips),
    refetchInterval: (q) => (q.state.data?.some((c) => c.status === "processing") ? POLL_MS : false),
  });
}

/** One clip; polled while it is uploading or being processed. */
export function useClip(id: string, enabled = true) {
  return useQuery({
    queryKey: clipKey(id),
    enabled,
    queryFn: () => fetchJson<{ clip: ClipView }>(`/api/clips/${id}`).then((r) => r.clip),
    refetchInterval: (q) => (inProgress(q.state.data?.status) ? POLL_MS : false),
  });
}

/** Every frame's pts in display order, for the player; fetched once a clip is ready (it never changes). */
export interface FrameIndex {
  timeBase: { num: number; den: number };
  frameCount: number;
  firstPts: number;
  nominalRate: string | null;
  averageRate: number;
  variableRate: boolean;
  keyframes: number[];
  pts: number[];
}

export function useFrameIndex(clipId: string, enabled = true) {
  return useQuery({
    queryKey: [...CLIPS, "frames", clipId],
    queryFn: () => fetchJson<FrameIndex>(`/api/clips/${clipId}/frames`),
    enabled,
    staleTime: Infinity,
  });
}

/** After an upload starts or finishes, the run's list is asked again. */
export function useRefreshRunClips(runId: string) {
  const qc = useQueryClient();
  return useCallback(() => void qc.invalidateQueries({ queryKey: runClipsKey(runId) }), [qc, runId]);
}

/** What the server has recorded of an unfinished upload. */
export function useUploadState(clipId: string) {
  return useQuery({ queryKey: [...CLIPS, "upload", clipId], queryFn: () => fetchJson<UploadState>(`/api/clips/${clipId}/upload`) });
}
