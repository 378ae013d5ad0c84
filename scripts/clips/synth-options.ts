import { parseArgs } from "node:util";

// Options of the synthetic clip generator, their defaults and the combinations a container can
// actually carry. Pure: no files, no processes.

export type Container = "mp4" | "mkv" | "avi" | "ts";
export const CONTAINERS: readonly Container[] = ["mp4", "mkv", "avi", "ts"];
export const FPS_CHOICES = ["24", "25", "30000/1001", "30", "60"] as const;

export interface SynthOptions {
  /** Nominal frame rate as a rational string, e.g. "30000/1001". */
  fps: string;
  /** Irregular frame intervals (see VFR_GAPS in synth-plan). */
  vfr: boolean;
  bframes: boolean;
  /** First presentation time in seconds (muxer offset). */
  start: number;
  container: Container;
  width: number;
  height: number;
  /** Seconds. */
  length: number;
  drops: number;
  seed: number;
  /**
   * Sensor noise: amplitude of uniform per-pixel luma noise before encoding (0 = none). At crf 23
   * most of it is quantised away: 6 leaves σ ≈ 0.5 grey levels, 10 about 1 (≈3 Mbit/s at 1080p30),
   * 12 about 1.8 but ten times the bitrate and a third slower.
   */
  noise: number;
  /** Absorption time of each drop in seconds (otherwise spread by the seed). */
  durations?: number[];
  /** x264 preset; the generator favours speed, recorders' files are not small either. */
  preset: string;
  out: string;
}

export const DEFAULTS: Omit<SynthOptions, "out"> = {
  fps: "30",
  vfr: false,
  bframes: false,
  start: 0,
  container: "mp4",
  width: 640,
  height: 360,
  length: 10,
  drops: 3,
  seed: 1,
  noise: 10,
  preset: "ultrafast",
};

export interface Rate {
  num: number;
  den: number;
}

export function parseRate(s: string): Rate {
  const m = /^(\d+)(?:\/(\d+))?$/.exec(s.trim());
  if (!m) throw new Error(`--fps must be a whole number or a fraction such as 30000/1001, got "${s}"`);
  const rate = { num: Number(m[1]), den: Number(m[2] ?? 1) };
  if (rate.num <= 0 || rate.den <= 0 || rate.num / rate.den > 240) throw new Error(`--fps ${s} is out of range`);
  return rate;
}

export function parseSize(s: string): { width: number; height: number } {
  const m = /^(\d+)x(\d+)$/.exec(s.trim());
  if (!m) throw new Error(`--size must look like 1920x1080, got "${s}"`);
  return { width: Number(m[1]), height: Number(m[2]) };
}

/** Fills defaults and refuses what the chosen container would silently get wrong. */
export function resolveOptions(partial: Partial<SynthOptions> & { out: string }): SynthOptions {
  // Without --container, the file name decides (clip.mkv is Matroska), else mp4.
  const ext = /\.(\w+)$/.exec(partial.out)?.[1]?.toLowerCase() as Container | undefined;
  const container = partial.container ?? (ext && CONTAINERS.includes(ext) ? ext : DEFAULTS.container);
  const o: SynthOptions = { ...DEFAULTS, ...partial, container };
  parseRate(o.fps);
  if (!CONTAINERS.includes(o.container)) throw new Error(`--container must be one of ${CONTAINERS.join(", ")}`);
  if (o.width % 2 || o.height % 2 || o.width < 160 || o.height < 90)
    throw new Error(`size ${o.width}x${o.height}: width and height must be even and at least 160x90`);
  if (!(o.length > 0) || o.length > 4 * 3600) throw new Error(`--length must be between 0 and 14400 seconds`);
  if (!Number.isInteger(o.drops) || o.drops < 1 || o.drops > 12) throw new Error(`--drops must be a whole number from 1 to 12`);
  if (!Number.isInteger(o.seed)) throw new Error(`--seed must be a whole number`);
  if (!(o.start >= 0)) throw new Error(`--start must be zero or more seconds`);
  if (!Number.isInteger(o.noise) || o.noise < 0 || o.noise > 40) throw new Error(`--noise must be a whole number from 0 to 40`);
  if (o.container === "avi") {
    // ffmpeg's AVI muxer never writes empty chunks before the first frame: an offset becomes
    // one frame at 0 followed by a gap. AVI has no field for a first timestamp either.
    if (o.start > 0) throw new Error("AVI cannot carry a start offset: it has no presentation timestamps");
    // AVI slots are decode times; with reordering and irregular slots the display times are lost.
    if (o.vfr && o.bframes) throw new Error("AVI cannot carry B-frames with a variable frame rate");
  }
  return o;
}

const HELP = `usage: synth-clip --out FILE [options]
  --fps ${FPS_CHOICES.join("|")}   nominal rate (default ${DEFAULTS.fps})
  --vfr                 irregular frame intervals
  --bframes             B-frames (3)
  --start SECONDS       first presentation time (not for avi)
  --container ${CONTAINERS.join("|")}   (default: from FILE's extension, else ${DEFAULTS.container}; avi holds MPEG-4 Part 2)
  --size WxH            640x360, 1280x720, 1920x1080, … (default ${DEFAULTS.width}x${DEFAULTS.height})
  --length SECONDS      (default ${DEFAULTS.length})
  --drops N             (default ${DEFAULTS.drops})
  --seed N              drop placement and durations (default ${DEFAULTS.seed})
  --noise N             sensor noise amplitude, 0 = none (default ${DEFAULTS.noise})
  --preset NAME         x264 preset (default ${DEFAULTS.preset})
Writes FILE and FILE.truth.json.`;

export function parseCli(argv: string[]): SynthOptions | { help: string } {
  const { values } = parseArgs({
    args: argv,
    options: {
      fps: { type: "string" },
      vfr: { type: "boolean" },
      bframes: { type: "boolean" },
      start: { type: "string" },
      container: { type: "string" },
      size: { type: "string" },
      length: { type: "string" },
      drops: { type: "string" },
      seed: { type: "string" },
      noise: { type: "string" },
      preset: { type: "string" },
      out: { type: "string" },
      help: { type: "boolean", short: "h" },
    },
    strict: true,
  });
  if (values.help || !values.out) return { help: HELP };
  const num = (v: string | undefined, name: string): number | undefined => {
    if (v === undefined) return undefined;
    const n = Number(v);
    if (!Number.isFinite(n)) throw new Error(`--${name} must be a number, got "${v}"`);
    return n;
  };
  const partial: Partial<SynthOptions> & { out: string } = { out: values.out };
  if (values.fps) partial.fps = values.fps;
  if (values.vfr) partial.vfr = true;
  if (values.bframes) partial.bframes = true;
  if (values.container) partial.container = values.container as Container;
  if (values.size) Object.assign(partial, parseSize(values.size));
  if (values.preset) partial.preset = values.preset;
  for (const k of ["start", "length", "drops", "seed", "noise"] as const) {
    const v = num(values[k], k);
    if (v !== undefined) partial[k] = v;
  }
  return resolveOptions(partial);
}
