import { describe, expect, it } from "vitest";
import { compareReadings, currentReadings, dropOutcome, dropTime, frameInterval, marksFrom, supersededIds, type ChainReading } from "@/lib/readings/rules";

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
    // Each mark is the first frame showing its event, so the event lies in the interval before the
    // marked frame: 40 − 0 = 40 ms before frame 1, 130 − 120 = 10 ms before frame 4 (this pinned the
    // interval after the frame, 30 and 40 ms, until that was found to be the wrong neighbour).
    // u² = (0.040² + 0.010²)/12 (GUM 4.3.7, rectangular marks); U = 2u.
    expect(t.ok && t.uncertainty.standard).toBeCloseTo(Math.sqrt((0.04 ** 2 + 0.01 ** 2) / 12), 15);
    expect(frameInterval(vfr, 5)).toBeCloseTo(0.04, 12);
    expect(frameInterval(vfr, 0)).toBeCloseTo(0.04, 12); // frame 0: the interval to the next frame
  });

  it("takes the interval before each marked frame: marks 1 and 5 on a clip with one long frame give U = 43.0 ms", () => {
    // pts in 1/15360: frame 5 follows a doubled interval (2048 to 3072). Intervals before the marks:
    // 512/15360 s and 1024/15360 s; U = 2·√((Δ₁² + Δ₂²)/12) = 43.0 ms (GUM 4.3.7, arithmetic).
    const ix = { pts: [0, 512, 1024, 1536, 2048, 3072, 3584, 4096], timeBase: { num: 1, den: 15360 } };
    const t = dropTime(ix, 1, 5);
    expect(t.ok && Number((t.uncertainty.expanded * 1000).toFixed(1))).toBe(43.0);
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

describe("drop state from readings", () => {
  const tb = { num: 1, den: 1000 };
  const r = (id: string, slot: number, dispensePts: number, clearPts: number, over: Partial<ChainReading> = {}): ChainReading => ({
    id,
    slot,
    status: "submitted",
    supersedesId: null,
    dispensePts,
    clearPts,
    ...over,
  });

  it("counts only submitted readings, and of a chain of corrections only the latest", () => {
    expect(dropOutcome([], tb, 0.5).state).toBe("unread");
    expect(dropOutcome([r("a", 1, 0, 2000, { status: "draft" })], tb, 0.5).state).toBe("unread");
    expect(dropOutcome([r("a", 1, 0, 2000)], tb, 0.5).state).toBe("read once");
    const chain = [r("a", 1, 0, 9000), r("a2", 1, 0, 2000, { supersedesId: "a" }), r("b", 2, 100, 2100)];
    expect(currentReadings(chain).map((x) => x.id)).toEqual(["a2", "b"]);
    expect(supersededIds(chain)).toEqual(new Set(["a"]));
    // A correction still in draft does not replace the submitted reading yet.
    expect(currentReadings([r("a", 1, 0, 9000), r("a2", 1, 0, 2000, { supersedesId: "a", status: "draft" })]).map((x) => x.id)).toEqual(["a"]);
  });

  it("agrees within the tolerance (mean of the two), and is a discrepancy beyond it, on the time or on either mark", () => {
    const agreed = dropOutcome([r("a", 1, 0, 2000), r("b", 2, 0, 2500)], tb, 0.5);
    expect(agreed).toMatchObject({ state: "agreed", agreement: { agreedValueS: 2.25, timeDifferenceS: 0.5 } });
    expect(dropOutcome([r("a", 1, 0, 2000), r("b", 2, 0, 2501)], tb, 0.5).state).toBe("discrepancy");
    // Same time, but both marks a second late: the marks disagree, so the readings do.
    expect(dropOutcome([r("a", 1, 0, 2000), r("b", 2, 1000, 3000)], tb, 0.5)).toMatchObject({
      state: "discrepancy",
      agreement: { timeDifferenceS: 0, dispenseDifferenceS: 1 },
    });
  });
});

describe("marks looked up in the frame index", () => {
  const ix = { pts: [1000, 1033, 1067, 1100, 1150], timeBase: { num: 1, den: 1000 } };
  it("keeps a single mark, computes the time once both are there, and refuses the rest with a reason", () => {
    expect(marksFrom(ix, 1, null)).toMatchObject({ dispensePts: 1033, clearPts: null, timeS: null });
    expect(marksFrom(ix, 1, 4)).toMatchObject({ dispensePts: 1033, clearPts: 1150, timeS: 0.117 });
    expect(marksFrom(ix, 4, 1)).toEqual({ ok: false, reason: "The clear frame (1) must come after the dispense frame (4)." });
    expect(marksFrom(ix, null, 5)).toEqual({ ok: false, reason: "The clear frame 5 is outside the clip, which has frames 0 to 4." });
  });
});
