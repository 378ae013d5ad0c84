// Frame ↔ media time for the player. Pure: no DOM, no React. A frame is identified by the media
// time at which it starts (its pts less the playback file's offset, in seconds).
import { frameToTimecode, type FrameRate } from "@/lib/stats/timecode";

export interface TimeBase {
  num: number;
  den: number;
}

/** Media time of every frame in the playback file, in display order. */
export function mediaTimes(pts: readonly number[], timeBase: TimeBase, offsetPts: number): number[] {
  return pts.map((p) => ((p - offsetPts) * timeBase.num) / timeBase.den);
}

/** Display interval of frame i: to the next frame; the last frame borrows its predecessor's. */
export function frameInterval(times: readonly number[], i: number): number {
  if (times.length < 2) return 0;
  if (i < times.length - 1) return times[i + 1] - times[i];
  return times[i] - times[i - 1];
}

/**
 * Where to seek to show frame i: the middle of its display interval. A browser shows the frame
 * whose interval contains the time, so the middle is safe from rounding on either edge.
 */
export function seekTarget(times: readonly number[], i: number): number {
  return times[i] + frameInterval(times, i) / 2;
}

/** How close a reported media time must be to a frame's start to be that frame (seconds). */
export function matchTolerance(times: readonly number[]): number {
  let smallest = Infinity;
  for (let i = 1; i < times.length; i++) smallest = Math.min(smallest, times[i] - times[i - 1]);
  // 1 ms, unless frames are so close that a quarter of the shortest gap is tighter.
  return Math.min(0.001, Number.isFinite(smallest) ? smallest / 4 : 0.001);
}

/** The frame that starts at `t` (within `tolerance`), or null when no frame of the index does. */
export function frameStartingAt(times: readonly number[], t: number, tolerance = matchTolerance(times)): number | null {
  let lo = 0;
  let hi = times.length - 1;
  while (lo <= hi) {
    const mid = (lo + hi) >> 1;
    if (times[mid] < t - tolerance) lo = mid + 1;
    else if (times[mid] > t + tolerance) hi = mid - 1;
    else return mid;
  }
  return null;
}

/** The frame whose display interval contains `t` (clamped to the clip): where playback stands. */
export function frameContaining(times: readonly number[], t: number): number {
  let lo = 0;
  let hi = times.length - 1;
  if (hi < 0) return 0;
  if (t < times[0]) return 0;
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if (times[mid] <= t) lo = mid;
    else hi = mid - 1;
  }
  return lo;
}

export const clampFrame = (frame: number, count: number) => Math.max(0, Math.min(count - 1, Math.round(frame)));

/**
 * The frame one span of seconds away from `from` (negative goes back), by the index's own times:
 * on a variable-rate clip a second is not a fixed number of frames. Lands on the frame showing at
 * that moment, and always moves at least one frame unless at the end.
 */
export function frameAfterSeconds(times: readonly number[], from: number, seconds: number): number {
  const n = times.length;
  if (n === 0) return 0;
  // A microsecond of slack: 40/30 − 1 is a hair below 10/30 in floating point.
  const at = frameContaining(times, times[from] + seconds + 1e-6);
  if (seconds > 0) return Math.min(n - 1, Math.max(at, from + 1));
  if (seconds < 0) return Math.max(0, Math.min(at, from - 1));
  return from;
}

/** "30000/1001" → {num, den}; null when absent or not a positive rational. */
export function parseRate(rate: string | null): FrameRate | null {
  const m = rate ? /^(\d+)(?:\/(\d+))?$/.exec(rate.trim()) : null;
  if (!m) return null;
  const r = { num: Number(m[1]), den: Number(m[2] ?? 1) };
  return r.num > 0 && r.den > 0 ? r : null;
}

/** SMPTE timecode of a frame at the clip's nominal rate; null without one. */
export function timecodeOf(frame: number, nominalRate: string | null): string | null {
  const rate = parseRate(nominalRate);
  return rate ? frameToTimecode(frame, rate) : null;
}

/** Seconds to the millisecond, with a sign when asked: "12.345 s", "−0.033 s". */
export function formatSeconds(s: number, signed = false): string {
  const ms = Math.round(s * 1000);
  const sign = ms < 0 ? "−" : signed && ms > 0 ? "+" : "";
  return `${sign}${(Math.abs(ms) / 1000).toFixed(3)} s`;
}

/** A frame's time in the clip as recorded: pts × time base (the first frame need not be at 0). */
export const clipTime = (pts: readonly number[], timeBase: TimeBase, frame: number) => (pts[frame] * timeBase.num) / timeBase.den;
