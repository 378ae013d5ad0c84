import { describe, expect, it } from "vitest";
import { compareReadings, dropTime, frameInterval } from "@/lib/readings/rules";

// A 30000/1001 clip in a 1/30000 time base starting at 10.5 s (pts 315000), one frame every 1001 ticks.
const ntsc = { pts: Array.from({ length: 6000 }, (_, i) => 315_000 + 1001 * i), timeBase: { num: 1, den: 30000 } };
// A variable-rate clip in a 1/1000 time base.
const vfr = { pts: [0, 40, 70, 120, 130, 170], timeBase: { num: 1, den: 1000 } };

describe("dropTime", () => {
  it("is the pts difference of the two marked frames, exactly, whatever the start offset", () => {
    const t = dropTime(ntsc, 30, 4530);
    expect(t.ok && t.ticks).toBe(4500 * 1001);
    expect(t.ok && t.seconds).toBeCloseTo(150.15, 12); // 4500 × 1001/30000 s (arithmetic)
  });

  it("uses each frame's own interval on a variable-rate clip (not frame count ÷ rate)", () => {
    const t = dropTime(vfr, 1, 4);
    expect(t.ok && t.seconds).toBeCloseTo(0.09, 12);
    // u² = (0.030² + 0.040²)/12 (GUM 4.3.7, rectangular marks); U = 2u.
    expect(t.ok && t.uncertainty.standard).toBeCloseTo(Math.sqrt((0.03 ** 2 + 0.04 ** 2) / 12), 15);
    expect(frameInterval(vfr, 5)).toBeCloseTo(0.04, 12);
  });

  it("refuses marks in the wrong order or outside the clip, with the reason", () => {
    expect(dropTime(ntsc, 100, 100)).toEqual({ ok: false, reason: "The clear frame (100) must come after the dispense frame (100)." });
    expect(dropTime(ntsc, 100, 6000)).toEqual({ ok: false, reason: "The clear frame 6000 is outside the clip, which has frames 0 to 5999." });
    expect(dropTime(ntsc, -1, 10)).toMatchObject({ ok: false, reason: expect.stringMatching(/dispense frame -1 is outside/) });
  });
});

describe("compareReadings", () => {
  const tb = ntsc.timeBase;
  const r = (d: number, c: number) => ({ dispensePts: ntsc.pts[d], clearPts: ntsc.pts[c] });

  it("agrees within the tolerance and takes the mean", () => {
    const a = compareReadings(r(30, 4530), r(31, 4535), tb, 0.5);
    expect(a.agreed).toBe(true);
    expect(a.timeDifferenceS).toBeCloseTo((4 * 1001) / 30000, 12);
    expect(a.agreedValueS).toBeCloseTo((4500 * 1001 + 4504 * 1001) / 2 / 30000, 12);
  });

  it("is a discrepancy when the times, or a single mark, differ beyond it", () => {
    expect(compareReadings(r(30, 4530), r(30, 4560), tb, 0.5).agreed).toBe(false);
    // Same duration, but both marks a second later: each mark is beyond the tolerance.
    const shifted = compareReadings(r(30, 4530), r(60, 4560), tb, 0.5);
    expect(shifted.agreed).toBe(false);
    expect(shifted.timeDifferenceS).toBe(0);
    expect(shifted.agreedValueS).toBeNull();
  });

  it("changes the sign of every difference when the readings swap", () => {
    const ab = compareReadings(r(30, 4530), r(33, 4540), tb, 1);
    const ba = compareReadings(r(33, 4540), r(30, 4530), tb, 1);
    expect(ba.timeDifferenceS).toBeCloseTo(-ab.timeDifferenceS, 12);
    expect(ba.clearDifferenceS).toBeCloseTo(-ab.clearDifferenceS, 12);
    expect(ba.agreedValueS).toBeCloseTo(ab.agreedValueS!, 12);
  });
});
