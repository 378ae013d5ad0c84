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
import { uploadFile, waitForClip } from "../helpers/clips";
import { demo } from "../helpers/fixtures";
import { newRun, newSample, newSubmission } from "../helpers/intake";

// Every variant of recording goes through the real upload and the real jobs. The frame index is
// checked against ffprobe's decoded frame list (-show_frames: slow, but the reference), and the
// frames the browser will step through (proxy, or the original) against the burned-in frame codes.
let tech: Client;
let runId: string;
const dir = mkdtempSync(path.join(process.env.TEST_TMP_DIR ?? os.tmpdir(), "wickmark-pipeline-"));

beforeAll(async () => {
  tech = await signedIn(demo.email("technician"), demo.password);
  const s = await newSubmission(tech, (await listOrganisations(db()))[0].id);
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
  const out = execFileSync("ffprobe", ["-v", "error", "-select_streams", "v:0", "-show_entries", entries, "-of", "json", file], { encoding: "utf8", maxBuffer: 1 << 26 });
  const json = JSON.parse(out) as { frames?: { best_effort_timestamp: number }[]; packets?: { dts: number }[] };
  const times = container === "avi" ? json.packets!.map((p) => p.dts) : json.frames!.map((f) => f.best_effort_timestamp);
  return container === "avi" ? times.sort((a, b) => a - b) : times;
}

describe("clip processing for every kind of recording", () => {
  for (const [name, opts] of CLIP_VARIANTS) {
    it(`${name}: index equals the decoded frame times, and the steppable frames carry their codes in order`, { timeout: 120_000 }, async () => {
      const { file, truth } = await renderSyntheticClip({ width: 320, height: 180, length: 3, drops: 1, noise: 4, ...opts, out: path.join(dir, variantFile(name, opts)) });
      const clip = await waitForClip(tech, (await uploadFile(tech, runId, file)).clipId);
      expect(clip.status, clip.rejectReason ?? "").toBe("ready");
      const index = await (await tech.get(`/api/clips/${clip.id}/frames`)).json();
      expect(index.frameCount).toBe(truth.video.frameCount);
      expect(index.pts).toEqual(ffprobeFrameTimes(file, opts.container ?? "mp4"));
      expect(index.variableRate).toBe(Boolean(opts.vfr));

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
    execFileSync("ffmpeg", ["-v", "error", "-y", "-f", "lavfi", "-i", "testsrc2=size=320x180:rate=30:duration=2", "-c:v", "libx264", "-preset", "ultrafast", "-bf", "0", "-g", "15", "-pix_fmt", "yuv420p", "-movflags", "+faststart", file]);
    const clip = await waitForClip(tech, (await uploadFile(tech, runId, file)).clipId);
    expect(clip.status).toBe("ready");
    expect(clip.playback!.isProxy).toBe(false);
    expect(clip.steps.find((s) => s.step === "proxy")).toMatchObject({ state: "skipped", reason: expect.stringMatching(/^Not needed: the original steps well/) });
  });
});
