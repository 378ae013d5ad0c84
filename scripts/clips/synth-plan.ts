import { parseRate, type Rate, type SynthOptions } from "./synth-options";

// What will be rendered, decided before ffmpeg runs: the frame times of the filter graph and,
// per drop, where it sits and when it is dispensed and gone. Pure and deterministic per seed.

/**
 * Frame intervals of a variable-rate clip, in ticks of a base clock running at 4× the nominal
 * rate: 0.5× to 2× the nominal interval, averaging exactly 1×. The 8 is one dropped frame.
 */
export const VFR_GAPS = [4, 3, 5, 4, 2, 6, 4, 4, 3, 5, 8, 2, 4, 3, 5, 2] as const;
export const VFR_MULTIPLIER = 4;
/** Opacity the fading drop has reached on its last visible frame; on the clear frame it is gone. */
export const FINAL_OPACITY = 0.3;
/** Longest absorption the generator schedules, seconds. */
export const MAX_DROP_SECONDS = 150;

export interface FramePlan {
  nominal: Rate;
  /** The graph's clock: nominal × multiplier; its ticks are the stream's time base. */
  base: Rate;
  multiplier: number;
  /** Ticks of the base clock the graph generates before frames are selected. */
  baseCount: number;
  /** Base-clock tick of every output frame, display order. */
  ticks: number[];
  /** Seconds of every output frame in the graph's own time (first frame at 0). */
  times: number[];
}

export function planFrames(o: Pick<SynthOptions, "fps" | "vfr" | "length">): FramePlan {
  const nominal = parseRate(o.fps);
  const multiplier = o.vfr ? VFR_MULTIPLIER : 1;
  const base = { num: nominal.num * multiplier, den: nominal.den };
  // Frames whose start lies inside [0, length): the 1e-9 keeps 10 s × 30 fps at 300, not 301.
  const baseCount = Math.ceil((o.length * base.num) / base.den - 1e-9);
  const ticks: number[] = [];
  if (!o.vfr) for (let t = 0; t < baseCount; t++) ticks.push(t);
  else for (let t = 0, i = 0; t < baseCount; t += VFR_GAPS[i++ % VFR_GAPS.length]) ticks.push(t);
  const times = ticks.map((t) => (t * base.den) / base.num);
  return { nominal, base, multiplier, baseCount, ticks, times };
}

/** The select expression keeping exactly the ticks of VFR_GAPS (n counts base-clock frames). */
export function vfrSelectExpr(): string {
  const period = VFR_GAPS.reduce((a, b) => a + b, 0);
  const offsets: number[] = [];
  VFR_GAPS.reduce((at, g) => (offsets.push(at), at + g), 0);
  return offsets.map((k) => `eq(mod(n,${period}),${k})`).join("+");
}

/** Small, seedable, good enough to scatter drops (mulberry32). */
export function rng(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Where the ball is in the frame: used by the surface image and to keep drops on the ball. */
export const BALL = { cx: 0.52, cy: 0.8, r: 0.62 /* of width */, light: { x: 0.36, y: 0.34 } } as const;

export interface DropPlan {
  index: number;
  /** Graph-time seconds, halfway between two frames so no rounding of a container moves the frame. */
  dispense: number;
  clear: number;
  dispenseFrame: number;
  clearFrame: number;
  /** Centre and semi-axes in output pixels (before camera shake). */
  x: number;
  y: number;
  rx: number;
  ry: number;
}

/** First index whose time is ≥ t (times ascending). */
export function firstAtOrAfter(times: readonly number[], t: number): number {
  let lo = 0;
  let hi = times.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (times[mid] >= t) hi = mid;
    else lo = mid + 1;
  }
  return lo;
}

function placeDrops(o: Pick<SynthOptions, "width" | "height" | "drops">, rand: () => number) {
  const { width: W, height: H } = o;
  const spots: { x: number; y: number; rx: number; ry: number }[] = [];
  for (let tries = 0; spots.length < o.drops; tries++) {
    if (tries > 20000) throw new Error(`cannot fit ${o.drops} drops on a ${W}x${H} frame`);
    const rx = H * (0.035 + 0.015 * rand());
    const ry = rx * (0.62 + 0.18 * rand()); // foreshortened: the cover curves away from the camera
    const x = W * (0.12 + 0.76 * rand());
    const y = H * (0.4 + 0.5 * rand());
    const onBall = Math.hypot(x - BALL.cx * W, y - BALL.cy * H) + 2 * rx < BALL.r * W;
    const offGlare = Math.hypot(x - BALL.light.x * W, y - BALL.light.y * H) > 0.12 * W;
    const inFrame = y + 2 * ry < H && x - 2 * rx > 0 && x + 2 * rx < W;
    const apart = spots.every((s) => Math.hypot(s.x - x, s.y - y) > 3 * Math.max(s.rx, rx));
    if (onBall && offGlare && inFrame && apart) spots.push({ x: Math.round(x), y: Math.round(y), rx, ry });
  }
  return spots;
}

/**
 * Drops take turns: drop i lives inside the i-th equal slot of the clip, so each has dry surface
 * before and after it. Durations are spread (longest to ~55 % of it), shuffled by the seed, so
 * drops are told apart by duration as well as by place.
 */
export function planDrops(
  o: Pick<SynthOptions, "width" | "height" | "drops" | "seed" | "length"> & { durations?: readonly number[] },
  frames: FramePlan,
): DropPlan[] {
  const rand = rng(o.seed);
  const spots = placeDrops(o, rand);
  const slot = o.length / o.drops;
  const longest = Math.min(MAX_DROP_SECONDS, 0.62 * slot);
  const fractions = Array.from({ length: o.drops }, (_, i) => (o.drops === 1 ? 1 : 1 - (0.45 * i) / (o.drops - 1)));
  for (let i = fractions.length - 1; i > 0; i--) {
    const j = Math.floor(rand() * (i + 1));
    [fractions[i], fractions[j]] = [fractions[j], fractions[i]];
  }
  const { times } = frames;
  const snap = (t: number) => {
    const k = Math.max(1, firstAtOrAfter(times, t));
    if (k >= times.length) throw new Error(`a drop would end after the clip's last frame; make the clip longer`);
    return { frame: k, time: (times[k - 1] + times[k]) / 2 };
  };
  return spots.map((s, i) => {
    const lead = slot * (0.08 + 0.14 * rand());
    // Given durations (the demo's, near a limit) are kept as they are; the slot must hold them.
    const spread = Math.min(MAX_DROP_SECONDS, longest * fractions[i] * (0.96 + 0.08 * rand()));
    const duration = o.durations?.[i] ?? spread;
    if (lead + duration >= slot) throw new Error(`drop ${i} of ${duration} s does not fit its ${slot.toFixed(1)} s share of the clip; make the clip longer`);
    const d = snap(i * slot + lead);
    const c = snap(i * slot + lead + duration);
    if (d.frame < 2 || c.frame - d.frame < 3) throw new Error(`clip too short for ${o.drops} drops at this frame rate`);
    return { index: i, dispense: d.time, clear: c.time, dispenseFrame: d.frame, clearFrame: c.frame, ...s };
  });
}

/** Camera shake amplitude (px) and the margin the surface image needs around the frame for it. */
export function shakeMargin(height: number): number {
  return Math.max(4, 2 * Math.round((4 * height) / 1080));
}
