import { describe, expect, it } from "vitest";
import { durationUncertainty, durationUncertaintyOfMarks, frameToTimecode, timecodeToFrame } from "@/lib/stats";

const NTSC = { num: 30000, den: 1001 };

// Source: GUM, JCGM 100:2008, 4.3.7 (rectangular distribution: u = a/√3). Check values from
// ../shared/reference/check-values.md §8: at 30000/1001 fps Δ = 33.367 ms, u = 13.62 ms,
// U = 27.24 ms; at 60 fps u = 6.80 ms.
describe("durationUncertainty (GUM)", () => {
  it("gives Δ/√6 and k = 2 at 29.97 fps", () => {
    const { standard, expanded } = durationUncertainty(1001 / 30000);
    expect(standard * 1000).toBeCloseTo(13.62, 2);
    expect(expanded * 1000).toBeCloseTo(27.24, 2);
  });
  it("gives 6.80 ms at 60 fps", () => {
    expect(durationUncertainty(1 / 60).standard * 1000).toBeCloseTo(6.8, 2);
  });
  it("equals the two-interval form when both marks have the same interval", () => {
    expect(durationUncertaintyOfMarks(0.04, 0.04).standard).toBeCloseTo(durationUncertainty(0.04).standard, 15);
  });
});

// Source: SMPTE ST 12-1 as summarised in broadcast glossaries; check values from
// ../shared/reference/check-values.md §3 (29.97 drop-frame).
describe("SMPTE drop-frame timecode at 30000/1001", () => {
  const TABLE: [string, number][] = [
    ["00:00:59;29", 1799],
    ["00:01:00;02", 1800],
    ["00:09:59;29", 17981],
    ["00:10:00;00", 17982],
    ["01:00:00;00", 107892],
  ];
  for (const [tc, frame] of TABLE) {
    it(`${tc} is frame ${frame}, both ways`, () => {
      expect(timecodeToFrame(tc, NTSC)).toBe(frame);
      expect(frameToTimecode(frame, NTSC)).toBe(tc);
    });
  }

  it("refuses timecodes that do not exist", () => {
    expect(() => timecodeToFrame("00:01:00;00", NTSC)).toThrow(/does not exist in drop-frame timecode/);
    expect(() => timecodeToFrame("00:01:00;01", NTSC)).toThrow(/does not exist/);
    expect(timecodeToFrame("00:10:00;01", NTSC)).toBe(17983);
    expect(() => timecodeToFrame("00:00:00;30", NTSC)).toThrow(/only 30 frames/);
    expect(() => timecodeToFrame("00:61:00;00", NTSC)).toThrow(/over 59/);
    expect(() => timecodeToFrame("1:00", NTSC)).toThrow(/not a timecode/);
  });

  it("round-trips every frame of the first twenty minutes (arithmetic)", () => {
    for (let f = 0; f < 20 * 60 * 30; f += 7) expect(timecodeToFrame(frameToTimecode(f, NTSC), NTSC)).toBe(f);
  });
});

describe("non-drop and 59.94 drop-frame timecode", () => {
  it("counts plainly at 25 fps", () => {
    expect(frameToTimecode(90_000, { num: 25, den: 1 })).toBe("01:00:00:00");
    expect(timecodeToFrame("00:00:01:24", { num: 25, den: 1 })).toBe(49);
  });
  it("drops four frame numbers a minute at 60000/1001 (twice the 29.97 counts, arithmetic)", () => {
    const r = { num: 60000, den: 1001 };
    expect(timecodeToFrame("00:10:00;00", r)).toBe(2 * 17982);
    expect(timecodeToFrame("01:00:00;00", r)).toBe(2 * 107892);
    expect(() => timecodeToFrame("00:01:00;03", r)).toThrow(/does not exist/);
    expect(frameToTimecode(2 * 1800, r)).toBe("00:01:00;04");
  });
});
