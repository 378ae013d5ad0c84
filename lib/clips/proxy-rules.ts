import type { Rational } from "../frame-index/summary";
import { codecName, containerName } from "./media-names";

/**
 * Does the proxy keep every frame of the original, in order, at the same time after the start
 * offset? Times are compared exactly as rationals, within half a tick of the proxy's time base.
 * Returns the first problem in words, or null.
 */
export function proxyMismatch(index: { pts: readonly number[]; timeBase: Rational }, proxy: { pts: readonly number[]; timeBase: Rational }): string | null {
  if (proxy.pts.length !== index.pts.length) return `the proxy has ${proxy.pts.length} frames where the original has ${index.pts.length}`;
  const first = index.pts[0];
  const a = index.timeBase;
  const b = proxy.timeBase;
  for (let i = 0; i < index.pts.length; i++) {
    // (pts − first)·a.num/a.den against p·b.num/b.den, cross-multiplied to stay in integers.
    const lhs = BigInt(index.pts[i] - first) * BigInt(a.num) * BigInt(b.den);
    const rhs = BigInt(proxy.pts[i]) * BigInt(b.num) * BigInt(a.den);
    const diff = lhs > rhs ? lhs - rhs : rhs - lhs;
    if (diff * 2n > BigInt(b.num) * BigInt(a.den)) {
      const t = (Number(index.pts[i] - first) * a.num) / a.den;
      const u = (proxy.pts[i] * b.num) / b.den;
      return `frame ${i} is at ${u.toFixed(6)} s in the proxy but ${t.toFixed(6)} s in the original`;
    }
  }
  return null;
}

/** About half a second of frames between keyframes, at least one. */
export function proxyGop(averageRate: number): number {
  return Math.max(1, Math.min(30, Math.round(averageRate / 2)));
}

/**
 * A proxy whose frames do not match the original's frame index, in words for the technician: what
 * is wrong with the recording, and what to do. The clip cannot be read without a proxy.
 */
export function proxyRefusal(problem: string): string {
  return (
    `The recording could not be made steppable: re-encoded, its frames do not keep the times the file gives them (${problem}). ` +
    "The file's timestamps are probably damaged, for example by a cut or a join made without re-encoding outside Wickmark. " +
    "Upload the recording as the recorder exported it (use Trim first here to shorten it), or export it again from the recorder."
  );
}

/** ffmpeg could not decode the recording to make the proxy (not a network failure). */
export function proxyBuildFailure(toolMessage: string): string {
  const said = toolMessage.replace(/^ffmpeg could not build the proxy:\s*/, "").slice(0, 200);
  return (
    `The recording could not be made steppable: decoding it failed (ffmpeg said: ${said}). ` +
    "The file is probably damaged or incomplete. Export it again from the recorder and upload the new file."
  );
}

/** Whether the original can be stepped frame by frame in a browser as it is (else a proxy is made). */
export function stepsWellInBrowser(p: { formatName: string; codec: string; hasBFrames: boolean; firstPts: number; maxKeyframeIntervalS: number }): {
  ok: boolean;
  reason: string;
} {
  if (!/\b(mp4|mov)\b/.test(p.formatName)) return { ok: false, reason: `browsers do not seek reliably in ${containerName(p.formatName)} files` };
  if (p.codec !== "h264") return { ok: false, reason: `${codecName(p.codec)} video does not play in every browser` };
  if (p.hasBFrames) return { ok: false, reason: "B-frames make some frames unreachable when stepping" };
  if (p.firstPts !== 0) return { ok: false, reason: "the first frame does not start at time 0" };
  if (p.maxKeyframeIntervalS > 0.55)
    return { ok: false, reason: `keyframes are up to ${p.maxKeyframeIntervalS.toFixed(2)} s apart, too far for quick stepping` };
  return { ok: true, reason: "the original steps well in a browser: H.264 in MP4, no B-frames, keyframes at least every 0.5 s" };
}
