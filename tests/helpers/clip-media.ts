import { execFileSync } from "node:child_process";
import { randomBytes } from "node:crypto";
import { statSync } from "node:fs";
import path from "node:path";
import { frameCodeFilter } from "@/lib/video/frame-code";
import { mediaDir } from "./media";

// Recordings for the browser upload tests, made with Debian's ffmpeg on the spot.
const ffmpeg = (args: string[]) => execFileSync("ffmpeg", ["-hide_banner", "-v", "error", "-y", ...args]);
const title = () => ["-metadata", `title=${randomBytes(8).toString("hex")}`];

/** A 720p H.264 MP4 of about `megabytes` (≈16 Mbit/s), big enough to span several upload parts. */
export function sizedMp4(megabytes: number, name = `sized-${randomBytes(3).toString("hex")}.mp4`): { file: string; size: number } {
  const file = path.join(mediaDir(), name);
  const seconds = (megabytes / 1.9).toFixed(2);
  ffmpeg([
    "-f",
    "lavfi",
    "-i",
    `testsrc2=size=1280x720:rate=25:duration=${seconds}`,
    "-c:v",
    "libx264",
    "-preset",
    "ultrafast",
    "-b:v",
    "16M",
    "-maxrate",
    "16M",
    "-bufsize",
    "4M",
    "-pix_fmt",
    "yuv420p",
    ...title(),
    file,
  ]);
  return { file, size: statSync(file).size };
}

/**
 * A clip whose every frame carries its display index as a frame code (lib/video/frame-code.ts),
 * with a keyframe exactly every `gop` frames: a trim can then be checked frame by frame.
 */
export function frameCodedMp4(opts: { seconds?: number; fps?: number; gop?: number; name?: string } = {}): string {
  const { seconds = 10, fps = 25, gop = 25 } = opts;
  const file = path.join(mediaDir(), opts.name ?? `coded-${randomBytes(3).toString("hex")}.mp4`);
  const [w, h] = [640, 360];
  ffmpeg([
    "-f",
    "lavfi",
    "-i",
    `testsrc2=size=${w}x${h}:rate=${fps}:duration=${seconds}`,
    "-vf",
    frameCodeFilter(w, h),
    "-c:v",
    "libx264",
    "-preset",
    "veryfast",
    "-crf",
    "16",
    "-g",
    String(gop),
    "-keyint_min",
    String(gop),
    "-sc_threshold",
    "0",
    "-pix_fmt",
    "yuv420p",
    ...title(),
    file,
  ]);
  return file;
}
