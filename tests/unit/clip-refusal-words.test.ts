import { describe, expect, it } from "vitest";
import { proxyBuildFailure, proxyRefusal } from "@/lib/clips/proxy-rules";
import type { ClipRow, StepRow } from "@/lib/clips/queries";
import { stepsWellInBrowser } from "@/lib/clips/proxy-rules";
import { STEPS } from "@/lib/clips/rules";
import { verdictFromProbe } from "@/lib/clips/verify-rules";
import { toClipView } from "@/lib/clips/view";

// Refusals and proxy reasons are read by technicians: they name the kind of file in words, never
// ffprobe's format list, and say what to do.
const ACCEPTED = "mov,mp4,m4a,3gp,3g2,mj2,matroska,webm,avi,mpegts,mpeg".split(",");
const probe = (format: string, codec = "h264") => ({
  format: { format_name: format, duration: "3.0" },
  streams: [{ index: 0, codec_type: "video", codec_name: codec, width: 320, height: 180, time_base: "1/90000", r_frame_rate: "25/1", avg_frame_rate: "25/1" }],
});

describe("refusals in a technician's words", () => {
  it("accepts MPEG program streams (.mpg, .vob)", () => {
    expect(verdictFromProbe(probe("mpeg", "mpeg2video"), ACCEPTED).ok).toBe(true);
  });

  it("refuses a raw H.264 or H.265 stream saying it carries no clock and what to export instead", () => {
    const v = verdictFromProbe(probe("h264"), [...ACCEPTED, "h264"]);
    expect(v).toEqual({
      ok: false,
      reason: expect.stringMatching(
        /^This file is a raw H\.264 stream: .*no frame carries a time.* Export the recording .*MP4, Matroska, or an MPEG program or transport stream/,
      ),
    });
    expect(verdictFromProbe(probe("hevc", "hevc"), ACCEPTED)).toMatchObject({ reason: expect.stringMatching(/^This file is a raw H\.265 \(HEVC\) stream/) });
  });

  it("names a refused container as people call it, with the right article, and lists what is accepted in words", () => {
    const v = verdictFromProbe(probe("flv"), ACCEPTED) as { reason: string };
    expect(v.reason).toBe(
      "This file is an flv file, which this lab does not accept for timing. Export the recording as one of: MP4 / QuickTime, Matroska / WebM, AVI, MPEG transport stream, MPEG program stream.",
    );
    expect(v.reason).not.toMatch(/container flv|mov,mp4/);
  });
});

describe("proxy reasons in a technician's words", () => {
  const base = { codec: "h264", hasBFrames: false, firstPts: 0, maxKeyframeIntervalS: 0.5 };
  it("never says 'a avi container' or a codec's ffprobe name", () => {
    expect(stepsWellInBrowser({ ...base, formatName: "avi" }).reason).toBe("browsers do not seek reliably in AVI files");
    expect(stepsWellInBrowser({ ...base, formatName: "mpeg" }).reason).toBe("browsers do not seek reliably in MPEG program stream files");
    expect(stepsWellInBrowser({ ...base, formatName: "mov,mp4,m4a,3gp,3g2,mj2", codec: "mpeg4" }).reason).toBe(
      "MPEG-4 Part 2 video does not play in every browser",
    );
  });

  it("a refused or failed proxy says what is wrong with the recording and what to do", () => {
    const r = proxyRefusal("frame 3 is at 0.120000 s in the proxy but 0.160000 s in the original");
    expect(r).toMatch(
      /^The recording could not be made steppable: .*\(frame 3 is at .*\)\. The file's timestamps are probably damaged.* Upload the recording as the recorder exported it/,
    );
    expect(proxyBuildFailure("ffmpeg could not build the proxy: Invalid data found when processing input")).toMatch(
      /decoding it failed \(ffmpeg said: Invalid data found when processing input\)\. .*Export it again from the recorder/,
    );
  });
});

describe("the steps of a refused clip", () => {
  it("read 'not needed' after a rejection, not 'pending'", () => {
    const clip = {
      id: "c",
      runId: "r",
      originalName: "x.h264",
      declaredSize: 1,
      storedSize: 1,
      status: "rejected",
      rejectReason: "raw",
      sha256: null,
      duplicateOf: null,
      createdAt: new Date(0),
      readyAt: null,
      probe: null,
    } as unknown as ClipRow;
    const steps: StepRow[] = STEPS.map((step) => ({
      step,
      state: step === "verify" ? "failed" : "pending",
      attempts: step === "verify" ? 1 : 0,
      reason: null,
      detail: null,
      startedAt: null,
      finishedAt: null,
    }));
    const view = toClipView(clip, steps, undefined, undefined, { original: null, proxy: null, poster: null, filmstrip: null });
    expect(view.steps.map((s) => s.state)).toEqual(["failed", "not_needed", "not_needed", "not_needed", "not_needed"]);
  });
});
