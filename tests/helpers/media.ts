import { execFileSync } from "node:child_process";
import { randomBytes } from "node:crypto";
import { mkdirSync, writeFileSync, readFileSync } from "node:fs";
import os from "node:os";
import path from "node:path";

// Small media files for upload tests, made with Debian's ffmpeg on the spot.
export const mediaDir = () => {
  const dir = path.join(process.env.TEST_TMP_DIR ?? os.tmpdir(), `wickmark-media-${process.pid}`);
  mkdirSync(dir, { recursive: true });
  return dir;
};

const ffmpeg = (args: string[]) => execFileSync("ffmpeg", ["-hide_banner", "-v", "error", "-y", ...args]);

/** A short H.264 MP4 with its index (moov) at the end, as recorders write it. */
export function plainMp4(name = `plain-${randomBytes(3).toString("hex")}.mp4`, seconds = 2): string {
  const out = path.join(mediaDir(), name);
  // The random title makes each file's bytes (and SHA-256) its own, so duplicates are only the ones a test makes.
  ffmpeg([
    "-f",
    "lavfi",
    "-i",
    `testsrc2=size=320x180:rate=25:duration=${seconds}`,
    "-c:v",
    "libx264",
    "-preset",
    "ultrafast",
    "-pix_fmt",
    "yuv420p",
    "-metadata",
    `title=${randomBytes(8).toString("hex")}`,
    out,
  ]);
  return out;
}

export function truncatedMp4(): string {
  const whole = readFileSync(plainMp4(`whole-${randomBytes(3).toString("hex")}.mp4`, 3));
  const out = path.join(mediaDir(), `truncated-${randomBytes(3).toString("hex")}.mp4`);
  writeFileSync(out, whole.subarray(0, Math.floor(whole.length / 2)));
  return out;
}

export function audioOnly(): string {
  const out = path.join(mediaDir(), `audio-${randomBytes(3).toString("hex")}.m4a`);
  ffmpeg(["-f", "lavfi", "-i", "sine=frequency=440:duration=2", "-c:a", "aac", out]);
  return out;
}

export function pngImage(): string {
  const out = path.join(mediaDir(), `still-${randomBytes(3).toString("hex")}.png`);
  ffmpeg(["-f", "lavfi", "-i", "testsrc2=size=320x180", "-frames:v", "1", out]);
  return out;
}

export function textFile(name = "notes.mp4"): string {
  const out = path.join(mediaDir(), `${randomBytes(3).toString("hex")}-${name}`);
  writeFileSync(out, "This is a text file, not a recording.\n".repeat(50));
  return out;
}

/**
 * A large file that is certainly no recording: text, unique per call. (Random bytes are not safe
 * here: ffprobe now and then takes them for an audio or MPEG stream.)
 */
export function largeTextFile(bytes: number): string {
  const out = path.join(mediaDir(), `large-${randomBytes(3).toString("hex")}.bin`);
  const line = `${randomBytes(8).toString("hex")} this is a text file, not a recording\n`;
  writeFileSync(out, line.repeat(Math.ceil(bytes / line.length)).slice(0, bytes));
  return out;
}

/** A clip that needs a stepping proxy (Matroska, B-frames) and takes a few seconds to proxy. */
export function clipNeedingProxy(seconds = 15): string {
  const out = path.join(mediaDir(), `needs-proxy-${randomBytes(3).toString("hex")}.mkv`);
  ffmpeg([
    "-f",
    "lavfi",
    "-i",
    `testsrc2=size=1280x720:rate=60:duration=${seconds}`,
    "-c:v",
    "libx264",
    "-preset",
    "ultrafast",
    "-bf",
    "3",
    "-g",
    "120",
    "-pix_fmt",
    "yuv420p",
    "-metadata",
    `title=${randomBytes(8).toString("hex")}`,
    out,
  ]);
  return out;
}
