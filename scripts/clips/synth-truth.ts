import type { PacketTimes } from "../../lib/frame-index/packets";
import { frameCodeGeometry, type FrameCodeGeometry } from "../../lib/video/frame-code";
import { ticksToSeconds } from "../../lib/frame-index/packet-order";
import { type DropPlan, FINAL_OPACITY, firstAtOrAfter, type FramePlan } from "./synth-plan";
import type { SynthOptions } from "./synth-options";

// The ground truth of a rendered clip, in the clip's own timeline: the plan's graph times moved by
// the offset the muxer applied, and frame numbers found again in the encoded file's timestamps.

export interface TruthDrop {
  index: number;
  /** Seconds in the clip's presentation time (start offset included). */
  dispenseTime: number;
  clearTime: number;
  /** clearTime − dispenseTime: the absorption time the drop was rendered with. */
  trueDuration: number;
  /** First frame (display index) whose pts ≥ dispenseTime: the first with the drop on it. */
  dispenseFrame: number;
  /** First frame whose pts ≥ clearTime: the first with no drop. */
  clearFrame: number;
  dispensePts: number;
  clearPts: number;
  /** pts(clear frame) − pts(dispense frame) in seconds: what two perfect marks would measure. */
  frameDuration: number;
  /** Centre and size in pixels, for a region of interest. */
  x: number;
  y: number;
  radius: number;
  radiusX: number;
  radiusY: number;
  finalOpacity: number;
}

export interface Truth {
  format: "wickmark-synthetic-truth/1";
  file: string;
  options: Omit<SynthOptions, "out">;
  video: {
    codec: "h264" | "mpeg4";
    frameCount: number;
    timeBase: { num: number; den: number };
    firstPts: number;
    firstPtsSeconds: number;
    startPts: number | null;
    /** Packet field the frame times come from ("dts" for AVI, which stores no pts). */
    clock: "pts" | "dts";
    keyframes: number[];
  };
  frameCode: FrameCodeGeometry;
  shakePx: number;
  drops: TruthDrop[];
}

export function buildTruth(
  file: string,
  opts: SynthOptions,
  frames: FramePlan,
  drops: DropPlan[],
  probe: PacketTimes,
  extra: { codec: "h264" | "mpeg4"; shakePx: number },
): Truth {
  const { pts, timeBase: tb } = probe;
  if (pts.length !== frames.ticks.length) throw new Error(`${file} has ${pts.length} frames, ${frames.ticks.length} were rendered`);
  for (let i = 1; i < pts.length; i++)
    if (pts[i] <= pts[i - 1]) throw new Error(`${file}: frame ${i} does not come after frame ${i - 1} (pts ${pts[i - 1]}, ${pts[i]})`);
  const seconds = pts.map((p) => ticksToSeconds(p, tb));
  // The muxer shifts every frame alike (start offset, MPEG-TS delay, B-frame delay), so one
  // offset maps graph time to clip time; the drop times sit mid-interval, far from any rounding.
  const shift = seconds[0] - frames.times[0];
  const out: TruthDrop[] = drops.map((d) => {
    const dispenseTime = d.dispense + shift;
    const clearTime = d.clear + shift;
    const dispenseFrame = firstAtOrAfter(seconds, dispenseTime);
    const clearFrame = firstAtOrAfter(seconds, clearTime);
    if (dispenseFrame !== d.dispenseFrame || clearFrame !== d.clearFrame) {
      throw new Error(
        `${file}: drop ${d.index} was rendered on frames ${d.dispenseFrame}–${d.clearFrame} but the file's timestamps give ${dispenseFrame}–${clearFrame}`,
      );
    }
    return {
      index: d.index,
      dispenseTime: round9(dispenseTime),
      clearTime: round9(clearTime),
      trueDuration: round9(d.clear - d.dispense),
      dispenseFrame,
      clearFrame,
      dispensePts: pts[dispenseFrame],
      clearPts: pts[clearFrame],
      frameDuration: round9(ticksToSeconds(pts[clearFrame] - pts[dispenseFrame], tb)),
      x: d.x,
      y: d.y,
      radius: Math.round(Math.max(d.rx, d.ry)),
      radiusX: round9(d.rx),
      radiusY: round9(d.ry),
      finalOpacity: FINAL_OPACITY,
    };
  });
  const { out: _out, ...options } = opts;
  return {
    format: "wickmark-synthetic-truth/1",
    file: file.split("/").pop() ?? file,
    options,
    video: {
      codec: extra.codec,
      frameCount: pts.length,
      timeBase: tb,
      firstPts: pts[0],
      firstPtsSeconds: round9(seconds[0]),
      startPts: probe.startPts,
      clock: probe.clock,
      keyframes: probe.keyframes,
    },
    frameCode: frameCodeGeometry(opts.width, opts.height),
    shakePx: extra.shakePx,
    drops: out,
  };
}

const round9 = (v: number) => Math.round(v * 1e9) / 1e9;
