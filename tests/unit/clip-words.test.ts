import { describe, expect, it } from "vitest";
import { containerName, describeIndex, groupDigits, indexDuration, proxyDecision } from "@/lib/clips/words";
import type { ClipView } from "@/lib/clips/view";

const index = (over: Partial<NonNullable<ClipView["index"]>> = {}): NonNullable<ClipView["index"]> => ({
  timeBase: { num: 1, den: 30000 },
  frameCount: 1800,
  firstPts: 315000,
  lastPts: 315000 + 1799 * 1001,
  nominalRate: "30000/1001",
  averageRate: 30000 / 1001,
  variableRate: false,
  maxKeyframeIntervalS: 1.001,
  width: 1920,
  height: 1080,
  rotation: 0,
  codec: "h264",
  hasBFrames: true,
  ...over,
});

describe("the frame index in words", () => {
  it("says what a technician needs to know in one line", () => {
    expect(describeIndex(index())).toBe("1\u202f800 frames, 29.97 fps average, constant rate, first timestamp 10.5 s, 1920×1080, H.264, B-frames: yes");
  });

  it("names a variable rate with its nominal rate, a rotation and an unknown codec as it is", () => {
    expect(describeIndex(index({ variableRate: true, averageRate: 27.3, rotation: 90, codec: "cfhd", hasBFrames: false, frameCount: 1, firstPts: 0 }))).toBe(
      "1 frame, 27.3 fps average, variable rate (nominal 29.97 fps), first timestamp 0 s, 1920×1080 rotated 90°, cfhd, B-frames: no",
    );
  });

  it("groups digits and measures the duration including the last frame", () => {
    expect(groupDigits(1234567)).toBe("1\u202f234\u202f567");
    expect(groupDigits(999)).toBe("999");
    expect(indexDuration(index())).toBeCloseTo(60.06, 6);
  });
});

describe("the proxy decision in words", () => {
  const steps = (state: ClipView["steps"][number]["state"], reason: string | null = null): ClipView["steps"] => [
    { step: "proxy", label: "Stepping proxy", state, attempts: 1, reason },
  ];
  it("says why a proxy was made, or why none is needed", () => {
    expect(
      proxyDecision({
        proxyReason: "Made because B-frames make some frames unreachable when stepping.",
        playback: { url: "u", isProxy: true, offsetPts: 0 },
        steps: steps("done"),
      }),
    ).toBe("A stepping proxy was made because B-frames make some frames unreachable when stepping.");
    expect(proxyDecision({ proxyReason: "the original steps well in a browser: H.264 in MP4", playback: null, steps: steps("skipped") })).toBe(
      "No stepping proxy is needed: the original steps well in a browser: H.264 in MP4.",
    );
    expect(proxyDecision({ proxyReason: null, playback: null, steps: steps("failed", "The stepping proxy was refused because frame 3 is missing.") })).toBe(
      "The stepping proxy was refused because frame 3 is missing.",
    );
    expect(proxyDecision({ proxyReason: null, playback: null, steps: steps("pending") })).toBeNull();
  });
});

describe("container names", () => {
  it("names ffprobe's format lists as people call them", () => {
    expect(containerName("mov,mp4,m4a,3gp,3g2,mj2")).toBe("MP4 / QuickTime");
    expect(containerName("matroska,webm")).toBe("Matroska / WebM");
    expect(containerName("flv")).toBe("flv");
  });
});
