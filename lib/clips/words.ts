// A clip's frame index and proxy decision said in words. Pure.
import type { ClipView } from "@/lib/clips/view";
import { codecName } from "@/lib/clips/media-names";

export { containerName } from "@/lib/clips/media-names";

type Index = NonNullable<ClipView["index"]>;

/** 1800 → "1 800": groups of three with a narrow no-break space (SI style), so a number never wraps. */
export function groupDigits(n: number): string {
  return String(Math.round(n)).replace(/\B(?=(\d{3})+(?!\d))/g, "\u202f");
}

/** Seconds with as many decimals as they need, up to three: 10.5 → "10.5 s", 0 → "0 s". */
export function seconds(s: number): string {
  return `${s.toFixed(3).replace(/\.?0+$/, "")} s`;
}

/** A measured time to the millisecond, zeros kept, so columns of drop times line up: "2.200 s". */
export function milliseconds(s: number): string {
  return `${s.toFixed(3)} s`;
}

export function rate(fps: number): string {
  return fps.toFixed(3).replace(/\.?0+$/, "");
}

export const ptsSeconds = (pts: number, tb: Index["timeBase"]) => (pts * tb.num) / tb.den;

/** Nominal rate "30000/1001" as fps. */
function nominal(r: string | null): number | null {
  if (!r) return null;
  const [a, b = "1"] = r.split("/");
  const v = Number(a) / Number(b);
  return Number.isFinite(v) && v > 0 ? v : null;
}

/** e.g. "1 800 frames, 29.97 fps average, constant rate, first timestamp 10.5 s, 1920×1080, H.264, B-frames: yes" */
export function describeIndex(ix: Index): string {
  const n = nominal(ix.nominalRate);
  const parts = [
    `${groupDigits(ix.frameCount)} frame${ix.frameCount === 1 ? "" : "s"}`,
    `${rate(ix.averageRate)} fps average`,
    ix.variableRate ? `variable rate${n ? ` (nominal ${rate(n)} fps)` : ""}` : "constant rate",
    `first timestamp ${seconds(ptsSeconds(ix.firstPts, ix.timeBase))}`,
    `${ix.width}×${ix.height}${ix.rotation ? ` rotated ${ix.rotation}°` : ""}`,
    codecName(ix.codec),
    `B-frames: ${ix.hasBFrames ? "yes" : "no"}`,
  ];
  return parts.join(", ");
}

/** Duration from the first to the last frame's timestamp, plus the last frame's own interval. */
export function indexDuration(ix: Index): number {
  const span = ptsSeconds(ix.lastPts - ix.firstPts, ix.timeBase);
  return ix.averageRate > 0 ? span + 1 / ix.averageRate : span;
}

/** Whether a stepping proxy was made, and why, as one sentence. */
export function proxyDecision(c: Pick<ClipView, "proxyReason" | "playback" | "steps">): string | null {
  const step = c.steps.find((s) => s.step === "proxy");
  if (c.proxyReason) {
    const made = c.playback?.isProxy ?? step?.state === "done";
    const why = c.proxyReason.replace(/^Made because /, "").replace(/\.$/, "");
    return made ? `A stepping proxy was made because ${why}.` : `No stepping proxy is needed: ${why}.`;
  }
  if (step?.state === "failed") return step.reason ?? "The stepping proxy could not be made.";
  return null;
}
