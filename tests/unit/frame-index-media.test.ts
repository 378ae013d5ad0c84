import { execFileSync } from "node:child_process";
import { mkdtempSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { probePacketTimes } from "@/lib/frame-index/packets";

// Recordings made on the spot with Debian's ffmpeg, small and short, whose frame index (read from
// packets, without decoding) must equal what a decoder outputs: ffprobe -show_frames is the
// reference (every frame decoded, its best-effort timestamp and key flag).
const dir = mkdtempSync(path.join(process.env.TEST_TMP_DIR ?? os.tmpdir(), "wickmark-index-media-"));
const ffmpeg = (args: string[]) => execFileSync("ffmpeg", ["-hide_banner", "-v", "error", "-y", ...args]);
const source = (seconds: number) => ["-f", "lavfi", "-i", `testsrc2=size=160x90:rate=25:duration=${seconds}`];
const x264 = ["-c:v", "libx264", "-preset", "ultrafast", "-bf", "2", "-g", "25", "-keyint_min", "25", "-sc_threshold", "0", "-pix_fmt", "yuv420p"];

function decoded(file: string, field: "best_effort_timestamp" | "pts" = "best_effort_timestamp"): { times: (number | undefined)[]; keyframes: number[] } {
  const out = execFileSync("ffprobe", ["-v", "quiet", "-select_streams", "v:0", "-show_entries", `frame=${field},key_frame`, "-of", "json", file], {
    encoding: "utf8",
    maxBuffer: 1 << 26,
  });
  const frames = (JSON.parse(out) as { frames: Record<string, number | undefined>[] }).frames;
  return { times: frames.map((f) => f[field]), keyframes: frames.flatMap((f, i) => (f.key_frame ? [i] : [])) };
}

function packetDts(file: string): number[] {
  const out = execFileSync("ffprobe", ["-v", "error", "-select_streams", "v:0", "-show_entries", "packet=dts", "-of", "csv=p=0", file], { encoding: "utf8" });
  return out
    .split("\n")
    .filter(Boolean)
    .map(Number)
    .sort((a, b) => a - b);
}

const file = (name: string) => path.join(dir, name);

describe("the frame index equals the frames a decoder outputs", () => {
  const h264 = file("h264-bframes.mp4");
  ffmpeg([...source(4), ...x264, h264]);

  it("MP4 cut by stream copy at a non-keyframe (edit list discards the GOP's first packets)", async () => {
    const cut = file("cut-mid-gop.mp4");
    ffmpeg(["-ss", "1.3", "-i", h264, "-c", "copy", cut]);
    const ix = await probePacketTimes(cut);
    const ref = decoded(cut);
    expect(ref.times.length).toBeGreaterThan(40);
    expect(ix.pts).toEqual(ref.times);
    expect(ix.keyframes).toEqual(ref.keyframes);
  });

  it("MP4 that starts with packets before its first keyframe (copied without it)", async () => {
    const cut = file("cut-leading.mp4");
    ffmpeg(["-i", h264, "-ss", "1.3", "-c", "copy", "-copyinkf", cut]);
    const ix = await probePacketTimes(cut);
    const ref = decoded(cut);
    expect(ix.pts).toEqual(ref.times);
    expect(ix.keyframes).toEqual(ref.keyframes);
  });

  it("AVI with MPEG-4 Part 2 B-frames: keyframes at their display positions", async () => {
    const avi = file("mpeg4-bframes.avi");
    ffmpeg([...source(3), "-c:v", "mpeg4", "-bf", "2", "-g", "12", avi]);
    const ix = await probePacketTimes(avi);
    const ref = decoded(avi);
    // Decoded AVI frames carry a later chunk's time (see ffprobe-packets.ts): the slots are the reference.
    expect(ix.pts).toEqual(packetDts(avi));
    expect(ix.pts.length).toBe(ref.times.length);
    expect(ref.keyframes).toEqual([0, 12, 24, 36, 48, 60, 72]);
    expect(ix.keyframes).toEqual(ref.keyframes);
  });

  for (const [name, args] of [
    ["MPEG program stream (.mpg), MPEG-2 video with B-frames", ["-c:v", "mpeg2video", "-bf", "2", "-g", "12", "-f", "mpeg"]],
    ["DVD program stream (.vob), MPEG-2 video with B-frames", ["-c:v", "mpeg2video", "-bf", "2", "-g", "12", "-f", "vob"]],
    ["MPEG program stream carrying H.264 with B-frames", [...x264, "-f", "mpeg"]],
  ] as const) {
    it(name, async () => {
      const f = file(`${name.replace(/\W+/g, "-")}.mpg`);
      ffmpeg([...source(3), ...args, f]);
      const ix = await probePacketTimes(f);
      const ref = decoded(f, "pts");
      expect(ix.timeBase).toEqual({ num: 1, den: 90000 });
      // Only some packets are stamped, so some decoded frames have no pts: those sit evenly between
      // their neighbours; every other frame keeps the time the file gives it.
      expect(ref.times.filter((t) => t !== undefined).length).toBeGreaterThan(ref.times.length / 3);
      expect(ix.pts.length).toBe(ref.times.length);
      // (A time not below the next one was given to the wrong frame by the decoder: H.264 in a program stream.)
      const inOrder = (t: number | undefined, i: number) => t !== undefined && ref.times.slice(i + 1).every((u) => u === undefined || u > t);
      ref.times.forEach((t, i) => inOrder(t, i) && expect(ix.pts[i], `frame ${i}`).toBe(t));
      expect(new Set(ix.pts.slice(1).map((t, i) => t - ix.pts[i]))).toEqual(new Set([3600])); // 25 fps in 90 kHz
      expect(ix.keyframes).toEqual(ref.keyframes);
    });
  }
});
