import { describe, expect, it } from "vitest";
import { assistStudy, type StudyDrop } from "@/lib/assist/study";

// Hand-built drops whose differences are worked out by hand (arithmetic), at 30 fps (1/30 s a frame).
const drop = (o: Partial<StudyDrop> & Pick<StudyDrop, "assist" | "agreed">): StudyDrop => ({
  dropId: "d",
  submissionReference: "S",
  sampleSerial: "B1",
  ordinal: 1,
  settledAt: "2026-11-03T10:00:00Z",
  frameIntervalS: 1 / 30,
  fps: 30,
  width: 1920,
  height: 1080,
  toleranceS: 0.5,
  unassisted: [],
  ...o,
});

const drops: StudyDrop[] = [
  // clear differs by +1 frame, dispense by 0: time +1/30.
  drop({ assist: { dispenseS: 10, clearS: 150 + 1 / 30 }, agreed: { dispenseS: 10, clearS: 150 }, unassisted: [{ dispenseS: 10, clearS: 150.2 }] }),
  // clear −0.3 s (9 frames), dispense +1 frame.
  drop({
    assist: { dispenseS: 20 + 1 / 30, clearS: 159.7 },
    agreed: { dispenseS: 20, clearS: 160 },
    settledAt: "2026-12-01T08:00:00Z",
    fps: 25,
    frameIntervalS: 0.04,
  }),
  // clear +0.6 s: outside the tolerance.
  drop({ assist: { dispenseS: 5, clearS: 145.6 }, agreed: { dispenseS: 5, clearS: 145 }, settledAt: "2026-12-02T08:00:00Z", width: 1280, height: 720 }),
];

describe("assistStudy", () => {
  const r = assistStudy(drops);

  it("gives bias, limits and shares for the clear frame against the agreed value", () => {
    const c = r.againstAgreed.clear;
    expect(c.n).toBe(3);
    // Differences 1/30, −0.3, 0.6: mean (0.0333… + 0.3) / 3 = 0.111111…
    expect(c.biasS).toBeCloseTo((1 / 30 - 0.3 + 0.6) / 3, 12);
    expect(c.withinFrame).toBeCloseTo(1 / 3, 12);
    expect(c.withinTolerance).toBeCloseTo(2 / 3, 12);
    expect(c.lowerS! < c.biasS! && c.biasS! < c.upperS!).toBe(true);
  });

  it("takes the drop time as clear minus dispense", () => {
    // 1/30, −0.3 − 1/30, 0.6
    expect(r.againstAgreed.time.biasS).toBeCloseTo((1 / 30 - 0.3 - 1 / 30 + 0.6) / 3, 12);
    expect(r.againstAgreed.dispense.withinFrame).toBe(1);
  });

  it("compares against unassisted readings only, and says there are too few for limits", () => {
    const u = r.againstUnassisted.clear;
    expect(u.n).toBe(1);
    expect(u.biasS).toBeNull();
    expect(u.withinFrame).toBe(0);
    expect(u.withinTolerance).toBe(1);
  });

  it("groups by month, frame rate and resolution", () => {
    expect(r.byMonth.map((g) => [g.key, g.n])).toEqual([
      ["2026-11", 1],
      ["2026-12", 2],
    ]);
    expect(r.byFrameRate.map((g) => g.key)).toEqual(["25 fps", "30 fps"]);
    expect(r.byResolution.map((g) => [g.key, g.n])).toEqual([
      ["1280×720", 1],
      ["1920×1080", 2],
    ]);
  });

  it("has no statistics and no shares for no drops", () => {
    const empty = assistStudy([]);
    expect(empty.n).toBe(0);
    expect(empty.againstAgreed.clear).toEqual({ n: 0, biasS: null, sdS: null, lowerS: null, upperS: null, withinFrame: null, withinTolerance: null });
  });
});
