import { execFileSync } from "node:child_process";
import { mkdtempSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb, db } from "@/lib/db";
import { listOrganisations } from "@/lib/organisations/queries";
import { readFrameCodes } from "@/lib/video/read-frame-codes";
import { renderSyntheticClip } from "@/scripts/clips/synth-clip";
import { signedIn, type Client } from "../helpers/app";
import { CLIP_VARIANTS, variantFile } from "../helpers/clip-variants";
import { copyEndFor, parsePacketCsv, trimArgs } from "@/lib/uploads/trim/trim-rules";
import { listReportClips } from "@/lib/reports/queries";
import { frameCodedMp4 } from "../helpers/clip-media";
import { uploadFile, waitForClip } from "../helpers/clips";
import { demo } from "../helpers/fixtures";
import { newRun, newSample, newSubmission } from "../helpers/intake";

// Every variant of recording goes through the real upload and the real jobs. The frame index is
// checked against ffprobe's decoded frame list (-show_frames: slow, but the reference), and the
// frames the browser will step through (proxy, or the original) against the burned-in frame codes.
let tech: Client;
let runId: string;
let submissionId: string;
const dir = mkdtempSync(path.join(process.env.TEST_TMP_DIR ?? os.tmpdir(), "wickmark-pipeline-"));

beforeAll(async () => {
  tech = await signedIn(demo.email("technician"), demo.password);
  const s = await newSubmission(tech, (await listOrganisations(db()))[0].id);
  submissionId = s.id;
  runId = (await newRun(tech, (await newSample(tech, s.id)).id)).id;
});
afterAll(() => closeDb());

/**
 * Each frame's timestamp as ffprobe reports it frame by frame: decoded frames (every frame is
 * decoded) for containers that store pts. AVI stores none: each chunk is one frame slot, and
 * decoded AVI frames carry a later chunk's time, so there the reference is each chunk's dts.
 */
function ffprobeFrameTimes(file: string, container: string): number[] {
  const entries = container === "avi" ? "packet=dts" : "frame=best_effort_timestamp";
  const out = execFileSync("ffprobe", ["-v", "error", "-select_streams", "v:0", "-show_entries", entries, "-of", "json", file], {
    encoding: "utf8",
    maxBuffer: 1 << 26,
  });
  const json = JSON.parse(out) as { frames?: { best_effort_timestamp: number }[]; packets?: { dts: number }[] };
  const times = container === "avi" ? json.packets!.map((p) => p.dts) : json.frames!.map((f) => f.best_effort_timestamp);
  return container === "avi" ? times.sort((a, b) => a - b) : times;
}

/** Display positions of the frames a decoder marks as key frames. */
function decodedKeyframes(file: string): number[] {
  const out = execFileSync("ffprobe", ["-v", "quiet", "-select_streams", "v:0", "-show_entries", "frame=key_frame", "-of", "csv=p=0", file], {
    encoding: "utf8",
    maxBuffer: 1 << 26,
  });
  return out
    .split("\n")
    .filter((l) => /^\d/.test(l))
    .flatMap((l, i) => (l.startsWith("1") ? [i] : []));
}

describe("clip processing for every kind of recording", () => {
  for (const [name, opts] of CLIP_VARIANTS) {
    it(`${name}: index equals the decoded frame times, and the steppable frames carry their codes in order`, { timeout: 120_000 }, async () => {
      const { file, truth } = await renderSyntheticClip({
        width: 320,
        height: 180,
        length: 3,
        drops: 1,
        noise: 4,
        ...opts,
        out: path.join(dir, variantFile(name, opts)),
      });
      const clip = await waitForClip(tech, (await uploadFile(tech, runId, file)).clipId);
      expect(clip.status, clip.rejectReason ?? "").toBe("ready");
      const index = await (await tech.get(`/api/clips/${clip.id}/frames`)).json();
      expect(index.frameCount).toBe(truth.video.frameCount);
      expect(index.pts).toEqual(ffprobeFrameTimes(file, opts.container ?? "mp4"));
      expect(index.variableRate).toBe(Boolean(opts.vfr));
      expect(index.keyframes).toEqual(decodedKeyframes(file));

      const steppable = clip.playback!.url;
      const codes = await readFrameCodes(steppable);
      expect(codes).toEqual(Array.from({ length: index.frameCount }, (_, i) => i));
      // The generator puts keyframes 2 s apart, too far for quick stepping: every variant gets a proxy.
      expect(clip.playback!.isProxy).toBe(true);
      expect(clip.steps.find((s) => s.step === "proxy")?.reason).toMatch(/^Made because /);
    });
  }

  it("an original that already steps well is played as it is, with no proxy", { timeout: 60_000 }, async () => {
    const file = path.join(dir, "steps-well.mp4");
    execFileSync("ffmpeg", [
      "-v",
      "error",
      "-y",
      "-f",
      "lavfi",
      "-i",
      "testsrc2=size=320x180:rate=30:duration=2",
      "-c:v",
      "libx264",
      "-preset",
      "ultrafast",
      "-bf",
      "0",
      "-g",
      "15",
      "-pix_fmt",
      "yuv420p",
      "-movflags",
      "+faststart",
      file,
    ]);
    const clip = await waitForClip(tech, (await uploadFile(tech, runId, file)).clipId);
    expect(clip.status).toBe("ready");
    expect(clip.playback!.isProxy).toBe(false);
    expect(clip.steps.find((s) => s.step === "proxy")).toMatchObject({
      state: "skipped",
      reason: expect.stringMatching(/^Not needed: the original steps well/),
    });
  });
});

describe("recordings cut, exported or streamed in other ways", () => {
  const synth = async (name: string, opts: Parameters<typeof renderSyntheticClip>[0] extends infer O ? Partial<O> : never = {}) =>
    (await renderSyntheticClip({ width: 320, height: 180, length: 3, drops: 1, noise: 4, bframes: true, ...opts, out: path.join(dir, name) })).file;
  const ffmpeg = (args: string[]) => execFileSync("ffmpeg", ["-hide_banner", "-v", "error", "-y", ...args]);

  it("an MP4 cut by stream copy at a non-keyframe: the index holds only the frames a decoder shows, and the proxy is made", { timeout: 120_000 }, async () => {
    const cut = path.join(dir, "cut-mid-gop.mp4");
    ffmpeg(["-ss", "1.3", "-i", await synth("before-cut.mp4"), "-c", "copy", cut]);
    const clip = await waitForClip(tech, (await uploadFile(tech, runId, cut)).clipId);
    expect(clip.status, clip.rejectReason ?? "").toBe("ready");
    const index = await (await tech.get(`/api/clips/${clip.id}/frames`)).json();
    expect(index.pts).toEqual(ffprobeFrameTimes(cut, "mp4"));
    expect(index.keyframes).toEqual(decodedKeyframes(cut));
    const shown = await readFrameCodes(cut);
    expect(await readFrameCodes(clip.playback!.url)).toEqual(shown);
    expect(shown.length).toBe(index.frameCount);
  });

  it("an MPEG program stream (.vob) is accepted and every frame steps in order", { timeout: 120_000 }, async () => {
    const vob = path.join(dir, "recorder-export.vob");
    ffmpeg(["-i", await synth("for-vob.mp4", { bframes: false }), "-c:v", "mpeg2video", "-q:v", "2", "-bf", "2", "-g", "12", "-f", "vob", vob]);
    const clip = await waitForClip(tech, (await uploadFile(tech, runId, vob, { type: "video/mpeg" })).clipId);
    expect(clip.status, clip.rejectReason ?? "").toBe("ready");
    const index = await (await tech.get(`/api/clips/${clip.id}/frames`)).json();
    expect(index.timeBase).toEqual({ num: 1, den: 90000 });
    expect(index.keyframes).toEqual(decodedKeyframes(vob));
    expect(await readFrameCodes(clip.playback!.url)).toEqual(Array.from({ length: index.frameCount }, (_, i) => i));
    expect(clip.steps.find((s) => s.step === "proxy")?.reason).toBe("Made because browsers do not seek reliably in MPEG program stream files.");
  });

  it("a raw H.264 stream is refused because it carries no clock, and the later steps are not needed", { timeout: 60_000 }, async () => {
    const raw = path.join(dir, "camera.h264");
    ffmpeg(["-i", await synth("for-raw.mp4"), "-c", "copy", "-bsf:v", "h264_mp4toannexb", "-f", "h264", raw]);
    const clip = await waitForClip(tech, (await uploadFile(tech, runId, raw, { type: "" })).clipId);
    expect(clip.status).toBe("rejected");
    expect(clip.rejectReason).toMatch(/^This file is a raw H\.264 stream: .*no frame carries a time.*Export the recording/);
    expect(clip.steps.map((s) => s.state)).toEqual(["failed", "not_needed", "not_needed", "not_needed", "not_needed"]);
  });
});

describe("a clip trimmed in the browser", () => {
  it("records the frames really kept, in the original's seconds, on the clip and in the report", { timeout: 120_000 }, async () => {
    // A keyframe every second at 25 fps; asking from 3.5 s, a copy without re-encoding starts at 3 s.
    const source = frameCodedMp4({ seconds: 8, fps: 25, gop: 25, name: "trim-source.mp4" });
    const packets = execFileSync("ffprobe", ["-v", "error", "-select_streams", "v:0", "-show_entries", "packet=pts_time,dts_time", "-of", "csv=p=0", source], {
      encoding: "utf8",
    });
    const out = path.join(dir, "trim-source-trim-3.5-6.mp4");
    // The same ffmpeg arguments the browser's trim uses (ffmpeg.wasm there, Debian's ffmpeg here).
    execFileSync("ffmpeg", ["-v", "error", "-y", ...trimArgs(source, out, 3.5, copyEndFor(parsePacketCsv(packets, 0), 6)).slice(1)]);
    const trim = { sourceName: "trim-source.mp4", sourceStartS: 0, requestedStartS: 3.5, requestedEndS: 6 };
    const clip = await waitForClip(tech, (await uploadFile(tech, runId, out, { trim })).clipId);
    expect(clip.status, clip.rejectReason ?? JSON.stringify(clip.steps)).toBe("ready");

    const codes = await readFrameCodes(out); // each frame's index in the original
    expect(codes[0]).toBe(75);
    expect(clip.trim).toMatchObject({ ...trim, keptFirstS: codes[0] / 25, keptLastS: codes[codes.length - 1] / 25 });
    expect(clip.trim!.note).toBe(
      `Trimmed in the browser from trim-source.mp4: asked for 3.5 s to 6 s; kept the frames shown from 3 s to ${codes[codes.length - 1] / 25} s of the original. It starts before the start asked for because a copy without re-encoding must begin at a keyframe.`,
    );
    const inReport = (await listReportClips(db(), submissionId)).find((c) => c.id === clip.id);
    expect(inReport?.trimNote).toBe(clip.trim!.note);
  });

  it("refuses a trim window that ends before it starts, in words", async () => {
    const res = await tech.post(`/api/runs/${runId}/clips`, {
      fileName: "x.mp4",
      size: 10,
      contentType: "video/mp4",
      trim: { sourceName: "x.mp4", sourceStartS: 0, requestedStartS: 5, requestedEndS: 2 },
    });
    expect(res.status).toBe(422);
    expect(await res.text()).toContain("The trim end must come after its start.");
  });
});
