import { spawn } from "node:child_process";
import { mkdtempSync, rmSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { probePacketTimes } from "@/lib/frame-index/packets";
import { ticksToSeconds } from "@/lib/frame-index/packet-order";
import { readFrameCodes } from "@/lib/video/read-frame-codes";
import { renderSyntheticClip, type SynthOptions, type Truth } from "@/scripts/clips/synth-clip";
import { planFrames } from "@/scripts/clips/synth-plan";

// Renders short clips for every variant the generator offers and checks them against what the
// product relies on: every frame present once in display order, strictly increasing timestamps,
// truth frames that match those timestamps, and a drop that is really there exactly from the
// dispense frame to the frame before the clear frame. Needs ffmpeg, no services.

const dir = mkdtempSync(path.join(process.env.TEST_TMP_DIR ?? os.tmpdir(), "wickmark-synth-test-"));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

type Variant = Partial<SynthOptions> & { name: string };
const base = { width: 640, height: 360, length: 3, drops: 2 } as const;
const VARIANTS: Variant[] = [
  { name: "24 fps", fps: "24" },
  { name: "25 fps", fps: "25" },
  { name: "30000/1001 fps", fps: "30000/1001" },
  { name: "30 fps", fps: "30", drops: 3 },
  { name: "60 fps", fps: "60" },
  { name: "vfr", vfr: true },
  { name: "B-frames", bframes: true },
  { name: "start 10.5 s", start: 10.5 },
  { name: "vfr + B-frames + start, 30000/1001", vfr: true, bframes: true, start: 10.5, fps: "30000/1001" },
  { name: "mkv", container: "mkv" },
  { name: "mkv vfr + B-frames + start", container: "mkv", vfr: true, bframes: true, start: 10.5 },
  { name: "ts", container: "ts" },
  { name: "ts vfr + B-frames + start", container: "ts", vfr: true, bframes: true, start: 10.5 },
  { name: "avi", container: "avi" },
  { name: "avi vfr", container: "avi", vfr: true, fps: "25" },
  { name: "avi B-frames", container: "avi", bframes: true },
];

/** Mean luma of a box at each drop's centre, per frame: one ffmpeg pass, one byte per drop per frame. */
function dropLuma(file: string, truth: Truth): Promise<number[][]> {
  const n = truth.drops.length;
  const boxes = truth.drops.map((d, i) => {
    const w = 2 * Math.max(2, Math.round(0.6 * d.radiusX));
    const h = 2 * Math.max(2, Math.round(0.6 * d.radiusY));
    return `[c${i}]crop=${w}:${h}:${Math.round(d.x - w / 2)}:${Math.round(d.y - h / 2)},scale=1:1:flags=area[l${i}]`;
  });
  const labels = truth.drops.map((_, i) => `[c${i}]`).join("");
  const joined = n === 1 ? "[l0]null[o]" : `${truth.drops.map((_, i) => `[l${i}]`).join("")}hstack=inputs=${n}[o]`;
  const graph = `[0:v]split=${n}${labels};${boxes.join(";")};${joined}`;
  const args = ["-v", "error", "-i", file, "-filter_complex", graph, "-map", "[o]", "-fps_mode", "passthrough", "-f", "rawvideo", "-pix_fmt", "gray", "pipe:1"];
  return new Promise((resolve, reject) => {
    const child = spawn("ffmpeg", args, { stdio: ["ignore", "pipe", "pipe"] });
    const chunks: Buffer[] = [];
    let err = "";
    child.stdout.on("data", (c: Buffer) => chunks.push(c));
    child.stderr.on("data", (c: Buffer) => (err += c.toString()));
    child.on("close", (code) => {
      if (code !== 0) return reject(new Error(err));
      const all = Buffer.concat(chunks);
      resolve(truth.drops.map((_, i) => Array.from({ length: all.length / n }, (_, f) => all[f * n + i])));
    });
  });
}

const median = (v: number[]) => [...v].sort((a, b) => a - b)[Math.floor(v.length / 2)];

describe.each(VARIANTS)("synthetic clip: $name", (variant) => {
  const { name, ...opts } = variant;
  const ext = opts.container ?? "mp4";
  const out = path.join(dir, `${name.replace(/[^a-z0-9]+/gi, "-")}.${ext}`);
  let rendered: Awaited<ReturnType<typeof renderSyntheticClip>>;

  it("renders with a truth file", async () => {
    rendered = await renderSyntheticClip({ ...base, ...opts, seed: 7, out });
    const expected = planFrames({ fps: opts.fps ?? "30", vfr: opts.vfr ?? false, length: base.length }).ticks.length;
    expect(rendered.truth.video.frameCount).toBe(expected);
    expect(rendered.truth.drops).toHaveLength(opts.drops ?? base.drops);
  });

  it("keeps every frame once, in display order (frame code = display index)", async () => {
    const codes = await readFrameCodes(out);
    expect(codes).toEqual(Array.from({ length: rendered.truth.video.frameCount }, (_, i) => i));
  });

  it("has strictly increasing timestamps, regular unless vfr, starting at the offset", async () => {
    const p = await probePacketTimes(out);
    expect(p.pts).toHaveLength(rendered.truth.video.frameCount);
    for (let i = 1; i < p.pts.length; i++) expect(p.pts[i]).toBeGreaterThan(p.pts[i - 1]);
    const steps = p.pts.slice(1).map((v, i) => ticksToSeconds(v - p.pts[i], p.timeBase));
    const spread = Math.max(...steps) - Math.min(...steps);
    // mkv stores milliseconds: a regular 30000/1001 clip steps 33 or 34 ms.
    if (opts.vfr) expect(spread).toBeGreaterThan(0.5 / 30);
    else expect(spread).toBeLessThanOrEqual(0.0011);
    const first = ticksToSeconds(p.pts[0], p.timeBase);
    const start = opts.start ?? 0;
    // MPEG-TS: ffmpeg's muxer adds 1.4 s, plus the B-frame delay when there are B-frames.
    if (ext === "ts") expect(first - start).toBeGreaterThanOrEqual(1.4 - 1e-9);
    if (ext === "ts") expect(first - start).toBeLessThan(1.6);
    else expect(first).toBeCloseTo(start, 3);
    expect(rendered.truth.video.firstPts).toBe(p.pts[0]);
    expect(p.keyframes[0]).toBe(0);
    // AVI stores no pts for reordered frames; its chunk slots (dts) are the timeline there.
    expect(p.clock).toBe(ext === "avi" && opts.bframes ? "dts" : "pts");
  });

  it("places dispense and clear frames at the first frames at or after the true times", async () => {
    const p = await probePacketTimes(out);
    const t = (i: number) => ticksToSeconds(p.pts[i], p.timeBase);
    for (const d of rendered.truth.drops) {
      for (const [frame, time, pts] of [
        [d.dispenseFrame, d.dispenseTime, d.dispensePts],
        [d.clearFrame, d.clearTime, d.clearPts],
      ] as const) {
        expect(t(frame)).toBeGreaterThanOrEqual(time);
        expect(t(frame - 1)).toBeLessThan(time);
        expect(pts).toBe(p.pts[frame]);
      }
      expect(d.frameDuration).toBeCloseTo(t(d.clearFrame) - t(d.dispenseFrame), 9);
      expect(Math.abs(d.frameDuration - d.trueDuration)).toBeLessThan(2.1 / 30);
    }
  });

  it("shows each drop from its dispense frame until just before its clear frame", async () => {
    const luma = await dropLuma(out, rendered.truth);
    rendered.truth.drops.forEach((d, i) => {
      const l = luma[i];
      const dry = median(l.slice(0, d.dispenseFrame));
      const msg = `drop ${d.index}: dry ${dry}, frames ${d.dispenseFrame - 1}..${d.dispenseFrame} = ${l[d.dispenseFrame - 1]},${l[d.dispenseFrame]}; ${d.clearFrame - 1}..${d.clearFrame} = ${l[d.clearFrame - 1]},${l[d.clearFrame]}`;
      // Relative to the dry cover under the drop: the marbling makes some spots much darker.
      const same = Math.max(3, 0.05 * dry);
      expect(Math.abs(l[d.dispenseFrame - 1] - dry), msg).toBeLessThanOrEqual(same);
      expect(dry - l[d.dispenseFrame], msg).toBeGreaterThan(0.2 * dry);
      expect(dry - l[d.clearFrame - 1], msg).toBeGreaterThan(Math.max(3, 0.07 * dry));
      for (const f of [d.clearFrame, d.clearFrame + 1]) if (f < l.length) expect(Math.abs(l[f] - dry), msg).toBeLessThanOrEqual(same);
    });
  });
});
