// Pure rules for clips: upload plans, object keys, the processing steps, and the frame index summary.
import { codecName, containerName } from "./media-names";

export const STEPS = ["verify", "hash", "index", "proxy", "thumbnails"] as const;
export type Step = (typeof STEPS)[number];
export const STEP_LABELS: Record<Step, string> = {
  verify: "Verify the file is a readable video",
  hash: "SHA-256 of the stored bytes",
  index: "Frame index (timestamp of every frame)",
  proxy: "Stepping proxy",
  thumbnails: "Poster and filmstrip",
};
export type ClipStatus = "uploading" | "processing" | "ready" | "rejected" | "failed";

export const S3_MAX_PARTS = 10_000;
export const S3_MIN_PART = 5 * 1024 * 1024;

/** Part size and count for a file: the configured size, grown if the file would need over 10 000 parts. */
export function planParts(size: number, partSizeBytes: number): { partSize: number; partCount: number } {
  let partSize = Math.max(partSizeBytes, S3_MIN_PART);
  while (Math.ceil(size / partSize) > S3_MAX_PARTS) partSize *= 2;
  return { partSize, partCount: Math.max(1, Math.ceil(size / partSize)) };
}

export type ObjectKind = "original" | "proxy.mp4" | "poster.jpg" | "filmstrip.jpg";

/** Keys come from ids only, never from what a user typed or named a file. */
export function clipObjectKey(clipId: string, kind: ObjectKind): string {
  return `clips/${clipId}/${kind}`;
}

export function formatBytes(n: number): string {
  if (n < 1024) return `${n} B`;
  const units = ["kB", "MB", "GB", "TB"];
  let v = n / 1024;
  let i = 0;
  while (v >= 1024 && i < units.length - 1) {
    v /= 1024;
    i++;
  }
  return `${v.toFixed(v < 10 ? 1 : 0)} ${units[i]}`;
}

export interface Rational {
  num: number;
  den: number;
}

export interface IndexSummary {
  frameCount: number;
  firstPts: number;
  lastPts: number;
  averageRate: number;
  variableRate: boolean;
  maxKeyframeIntervalS: number;
}

/**
 * Summary of display-ordered pts. A clip counts as variable-rate when its frame intervals differ
 * by more than one tick and more than 1 % of the typical interval: a constant 30000/1001 rate in a
 * 1/1000 time base alternates 33 and 34 ticks and is still constant.
 */
export function summarizeIndex(pts: readonly number[], timeBase: Rational, keyframes: readonly number[]): IndexSummary {
  const n = pts.length;
  const tick = timeBase.num / timeBase.den;
  const deltas: number[] = [];
  for (let i = 1; i < n; i++) deltas.push(pts[i] - pts[i - 1]);
  const sorted = [...deltas].sort((a, b) => a - b);
  const median = sorted.length ? sorted[Math.floor(sorted.length / 2)] : 0;
  const spread = sorted.length ? sorted[sorted.length - 1] - sorted[0] : 0;
  const span = n > 1 ? (pts[n - 1] - pts[0]) * tick : 0;
  let maxKey = 0;
  const keys = [...keyframes].sort((a, b) => a - b);
  for (let i = 0; i < keys.length; i++) {
    const next = i + 1 < keys.length ? pts[keys[i + 1]] : pts[n - 1];
    maxKey = Math.max(maxKey, (next - pts[keys[i]]) * tick);
  }
  if (keys.length === 0 && n > 0) maxKey = span;
  return {
    frameCount: n,
    firstPts: n ? pts[0] : 0,
    lastPts: n ? pts[n - 1] : 0,
    averageRate: span > 0 ? (n - 1) / span : 0,
    variableRate: spread > 1 && spread > 0.01 * median,
    maxKeyframeIntervalS: maxKey,
  };
}

/** Whether the original can be stepped frame by frame in a browser as it is (else a proxy is made). */
export function stepsWellInBrowser(p: { formatName: string; codec: string; hasBFrames: boolean; firstPts: number; maxKeyframeIntervalS: number }): { ok: boolean; reason: string } {
  if (!/\b(mp4|mov)\b/.test(p.formatName)) return { ok: false, reason: `browsers do not seek reliably in ${containerName(p.formatName)} files` };
  if (p.codec !== "h264") return { ok: false, reason: `${codecName(p.codec)} video does not play in every browser` };
  if (p.hasBFrames) return { ok: false, reason: "B-frames make some frames unreachable when stepping" };
  if (p.firstPts !== 0) return { ok: false, reason: "the first frame does not start at time 0" };
  if (p.maxKeyframeIntervalS > 0.55) return { ok: false, reason: `keyframes are up to ${p.maxKeyframeIntervalS.toFixed(2)} s apart, too far for quick stepping` };
  return { ok: true, reason: "the original steps well in a browser: H.264 in MP4, no B-frames, keyframes at least every 0.5 s" };
}

/** pts as int64 little-endian, the stored form of a frame index. */
export function encodePts(pts: readonly number[]): Buffer {
  const b = Buffer.alloc(pts.length * 8);
  pts.forEach((p, i) => b.writeBigInt64LE(BigInt(p), i * 8));
  return b;
}

export function decodePts(b: Buffer): number[] {
  const out: number[] = new Array(b.length / 8);
  for (let i = 0; i < out.length; i++) out[i] = Number(b.readBigInt64LE(i * 8));
  return out;
}
