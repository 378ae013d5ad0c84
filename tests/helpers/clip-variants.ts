import type { SynthOptions } from "@/scripts/clips/synth-clip";

/** Every kind of recording the pipeline and the player must handle, as synthetic clip options. */
export const CLIP_VARIANTS: [string, Partial<SynthOptions>][] = [
  ["24 fps mp4", { fps: "24" }],
  ["25 fps mp4", { fps: "25" }],
  ["29.97 fps mp4", { fps: "30000/1001" }],
  ["30 fps mp4", { fps: "30" }],
  ["60 fps mp4", { fps: "60" }],
  ["variable frame rate", { vfr: true }],
  ["B-frames", { bframes: true }],
  ["first timestamp 10.5 s", { start: 10.5 }],
  ["Matroska", { container: "mkv" }],
  ["AVI", { container: "avi" }],
  ["AVI, MPEG-4 Part 2 with B-frames", { container: "avi", bframes: true }],
  ["MPEG-TS", { container: "ts" }],
  ["MPEG-TS, 29.97, VFR, B-frames, start 3 s", { container: "ts", fps: "30000/1001", vfr: true, bframes: true, start: 3 }],
];

/** A file name for a variant's rendered clip. */
export const variantFile = (name: string, opts: Partial<SynthOptions>) => `${name.replace(/\W+/g, "-")}.${opts.container ?? "mp4"}`;
