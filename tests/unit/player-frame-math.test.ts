import { describe, expect, it } from "vitest";
import {
  clipTime,
  formatSeconds,
  frameAfterSeconds,
  frameContaining,
  frameInterval,
  frameStartingAt,
  matchTolerance,
  mediaTimes,
  parseRate,
  seekTarget,
  timecodeOf,
} from "@/components/player/frame-math";

// 29.97 fps in a 1/30000 time base, first pts 315315 (10.5105 s), as a proxy re-based to 0 would be.
const NTSC_TB = { num: 1, den: 30000 };
const ntscPts = Array.from({ length: 90 }, (_, i) => 315315 + 1001 * i);
// A variable-rate clip in a 1/1000 time base: gaps of 33, 50, 20 and 100 ms.
const vfrPts = [0, 33, 83, 103, 203, 236, 286, 306, 406, 439, 489, 509, 609, 642, 692, 712, 812, 845, 895, 915, 1015, 1048, 1098];
const MS_TB = { num: 1, den: 1000 };

describe("media time of each frame", () => {
  it("subtracts the playback file's offset and scales by the time base", () => {
    const t = mediaTimes(ntscPts, NTSC_TB, 315315);
    expect(t[0]).toBe(0);
    expect(t[1]).toBeCloseTo(1001 / 30000, 12);
    expect(t[89]).toBeCloseTo((89 * 1001) / 30000, 12);
  });

  it("keeps the clip's own first timestamp when the original is played (offset 0)", () => {
    expect(mediaTimes([10500, 10540], MS_TB, 0)).toEqual([10.5, 10.54]);
  });
});

describe("seek target: the middle of the frame's display interval", () => {
  const t = mediaTimes(vfrPts, MS_TB, 0);
  it("uses the gap to the next frame, which varies on a variable-rate clip", () => {
    expect(seekTarget(t, 0)).toBeCloseTo(0.0165, 12);
    expect(seekTarget(t, 1)).toBeCloseTo(0.058, 12);
    expect(seekTarget(t, 3)).toBeCloseTo(0.153, 12);
  });

  it("gives the last frame its predecessor's interval", () => {
    expect(frameInterval(t, t.length - 1)).toBeCloseTo(0.05, 12);
    expect(seekTarget(t, t.length - 1)).toBeCloseTo(1.123, 12);
  });

  it("lands inside the frame's interval for every frame, so the frame containing it is the frame", () => {
    t.forEach((_, i) => expect(frameContaining(t, seekTarget(t, i))).toBe(i));
  });
});

describe("matching a painted frame's media time to the index", () => {
  const t = mediaTimes(ntscPts, NTSC_TB, 315315);
  it("finds the frame that starts within a millisecond", () => {
    expect(frameStartingAt(t, 0)).toBe(0);
    expect(frameStartingAt(t, (45 * 1001) / 30000 + 0.0004)).toBe(45);
    // Browsers report whole microseconds.
    expect(frameStartingAt(t, Math.round(((17 * 1001) / 30000) * 1e6) / 1e6)).toBe(17);
  });

  it("matches nothing between frames or outside the clip", () => {
    expect(frameStartingAt(t, seekTarget(t, 10))).toBeNull();
    expect(frameStartingAt(t, -0.5)).toBeNull();
    expect(frameStartingAt(t, 99)).toBeNull();
  });

  it("narrows the tolerance when frames are closer than 4 ms", () => {
    expect(matchTolerance(t)).toBe(0.001);
    expect(matchTolerance([0, 0.002, 0.004])).toBeCloseTo(0.0005, 12);
  });
});

describe("one second by the frames' own times", () => {
  const t = mediaTimes(vfrPts, MS_TB, 0);
  it("lands on the frame showing one second later, not 30 frames later", () => {
    // Frame 1 starts at 33 ms; 1.033 s falls in frame 20 (1.015–1.048 s), 0.048 s in frame 1.
    expect(frameAfterSeconds(t, 1, 1)).toBe(20);
    expect(frameAfterSeconds(t, 21, -1)).toBe(1);
  });

  it("stops at either end and always moves at least one frame", () => {
    expect(frameAfterSeconds(t, 20, 1)).toBe(22);
    expect(frameAfterSeconds(t, 2, -1)).toBe(0);
    expect(frameAfterSeconds([0, 2, 4], 0, 1)).toBe(1);
    expect(frameAfterSeconds([0, 2, 4], 2, -1)).toBe(1);
  });

  it("counts 30 frames at a constant 30 fps", () => {
    const c = mediaTimes(
      Array.from({ length: 100 }, (_, i) => i),
      { num: 1, den: 30 },
      0,
    );
    expect(frameAfterSeconds(c, 10, 1)).toBe(40);
    expect(frameAfterSeconds(c, 40, -1)).toBe(10);
  });
});

describe("what the readout shows", () => {
  it("gives the clip time as pts × time base to the millisecond", () => {
    expect(formatSeconds(clipTime(ntscPts, NTSC_TB, 0))).toBe("10.511 s");
    expect(formatSeconds(clipTime([10500], MS_TB, 0))).toBe("10.500 s");
  });

  it("signs time since the dispense mark", () => {
    expect(formatSeconds(1.2345, true)).toBe("+1.235 s");
    expect(formatSeconds(-0.0333, true)).toBe("−0.033 s");
    expect(formatSeconds(0, true)).toBe("0.000 s");
  });

  it("writes drop-frame timecode at 30000/1001 and none without a nominal rate", () => {
    // Frame 1800 at 29.97 drop-frame is 00:01:00;02 (SMPTE ST 12-1: frames 00 and 01 skipped).
    expect(timecodeOf(1800, "30000/1001")).toBe("00:01:00;02");
    expect(timecodeOf(1800, "30")).toBe("00:01:00:00");
    expect(timecodeOf(1800, null)).toBeNull();
    expect(parseRate("25")).toEqual({ num: 25, den: 1 });
    expect(parseRate("0/1")).toBeNull();
  });
});
