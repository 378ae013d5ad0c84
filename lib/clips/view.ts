import type { FrameIndexRow } from "../frame-index/queries";
import type { RenditionRow } from "./rendition-queries";
import type { ClipRow, StepRow } from "./queries";
import { STEP_LABELS, STEPS, type ClipStatus, type Step } from "./rules";
import { trimKept, type TrimKept } from "./trim-provenance";

export interface ClipView {
  id: string;
  runId: string;
  originalName: string;
  declaredSize: number;
  storedSize: number | null;
  status: ClipStatus;
  rejectReason: string | null;
  sha256: string | null;
  duplicateOf: string | null;
  createdAt: string;
  readyAt: string | null;
  format: string | null;
  /** "not_needed": a step that never ran because the clip was rejected or failed before it. */
  steps: { step: Step; label: string; state: StepRow["state"] | "not_needed"; attempts: number; reason: string | null }[];
  index: Omit<FrameIndexRow, "clipId" | "keyframes"> | null;
  playback: { url: string; isProxy: boolean; offsetPts: number } | null;
  posterUrl: string | null;
  filmstrip: { url: string; tiles: number } | null;
  proxyReason: string | null;
  /** Set when the clip was trimmed in the browser: the window asked for and the frames really kept. */
  trim: TrimKept | null;
}

export function toClipView(
  c: ClipRow,
  steps: StepRow[],
  index: FrameIndexRow | undefined,
  rendition: RenditionRow | undefined,
  urls: { original: string | null; proxy: string | null; poster: string | null; filmstrip: string | null },
): ClipView {
  const byStep = new Map(steps.map((s) => [s.step, s]));
  const ready = c.status === "ready";
  const { clipId: _c, keyframes: _k, ...summary } = index ?? ({} as FrameIndexRow);
  return {
    id: c.id,
    runId: c.runId,
    originalName: c.originalName,
    declaredSize: c.declaredSize,
    storedSize: c.storedSize,
    status: c.status,
    rejectReason: c.rejectReason,
    sha256: c.sha256,
    duplicateOf: c.duplicateOf,
    createdAt: c.createdAt.toISOString(),
    readyAt: c.readyAt?.toISOString() ?? null,
    format: c.probe?.formatName ?? null,
    steps: steps.length
      ? STEPS.map((s) => {
          const state = byStep.get(s)?.state ?? "pending";
          const stopped = (c.status === "rejected" || c.status === "failed") && state === "pending";
          return {
            step: s,
            label: STEP_LABELS[s],
            state: stopped ? "not_needed" : state,
            attempts: byStep.get(s)?.attempts ?? 0,
            reason: byStep.get(s)?.reason ?? null,
          };
        })
      : [],
    index: index ? summary : null,
    playback:
      ready && index
        ? urls.proxy
          ? { url: urls.proxy, isProxy: true, offsetPts: rendition?.proxyOffsetPts ?? index.firstPts }
          : urls.original
            ? { url: urls.original, isProxy: false, offsetPts: 0 }
            : null
        : null,
    posterUrl: urls.poster,
    filmstrip: urls.filmstrip && rendition?.filmstripTiles ? { url: urls.filmstrip, tiles: rendition.filmstripTiles } : null,
    proxyReason: rendition?.proxyReason || null,
    trim: c.trim ? trimKept(c.trim, index) : null,
  };
}
