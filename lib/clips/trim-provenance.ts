// What a clip trimmed in the browser really holds of its original, in the original's own seconds.
// The trim copies packets with their timestamps (ffmpeg -copyts), so the clip's first and last
// frame times, less the original's start time, are where those frames sat in the original. Pure.
import type { Rational } from "../frame-index/summary";
import type { TrimSource } from "./schema";

export interface TrimKept extends TrimSource {
  /** The first and last frame kept, in seconds from the original's start; null until the index is built. */
  keptFirstS: number | null;
  keptLastS: number | null;
  note: string;
}

const s = (v: number) => `${v.toFixed(3).replace(/\.?0+$/, "")} s`;

export function trimKept(trim: TrimSource, index: { firstPts: number; lastPts: number; timeBase: Rational } | null | undefined): TrimKept {
  const at = (pts: number) => Math.round(((pts * index!.timeBase.num) / index!.timeBase.den - trim.sourceStartS) * 1e6) / 1e6;
  const keptFirstS = index ? at(index.firstPts) : null;
  const keptLastS = index ? at(index.lastPts) : null;
  return { ...trim, keptFirstS, keptLastS, note: trimNote(trim, keptFirstS, keptLastS) };
}

/** e.g. "Trimmed in the browser from run.mp4: asked for 1 s to 7 s; kept the frames shown from 0 s to 7 s of the original." */
export function trimNote(t: TrimSource, first: number | null, last: number | null): string {
  const asked = `Trimmed in the browser from ${t.sourceName}: asked for ${s(t.requestedStartS)} to ${s(t.requestedEndS)}`;
  if (first === null || last === null) return `${asked}; what was kept is known once the frame index is built.`;
  const why = first < t.requestedStartS - 1e-6 ? ` It starts before the start asked for because a copy without re-encoding must begin at a keyframe.` : "";
  return `${asked}; kept the frames shown from ${s(first)} to ${s(last)} of the original.${why}`;
}
