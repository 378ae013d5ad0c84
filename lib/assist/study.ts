import { blandAltman } from "../stats/agreement";
import { LIMITS_MULTIPLIER } from "../agreement/rules";

// The assist-versus-reader study: how far the assist's suggested frames stand from what people
// read, over the lab's own settled drops. Pure, browser-safe. The assist never replaces a reading;
// this tells the lab, from its own data, how far its suggestions can be trusted.

export const STUDY_MEASURES = ["dispense", "clear", "time"] as const;
export type StudyMeasure = (typeof STUDY_MEASURES)[number];

/** Seconds in the clip's own timeline (dispense, clear) and their difference (time). */
export interface Marks {
  dispenseS: number;
  clearS: number;
}

export interface StudyDrop {
  dropId: string;
  submissionReference: string;
  sampleSerial: string;
  ordinal: number;
  /** When the drop settled (ISO 8601): its month groups the trend. */
  settledAt: string;
  /** The clip's typical frame interval (s), for "within one frame". */
  frameIntervalS: number;
  /** Nominal frame rate (frames per second) and picture size, for the breakdowns. */
  fps: number;
  width: number;
  height: number;
  /** The edition's reading tolerance (s). */
  toleranceS: number;
  assist: Marks;
  /** The agreed value: the mean of the two readings that count, or the lead's ruling. */
  agreed: Marks;
  /** Each reading that counts whose reader had not seen the assist. */
  unassisted: Marks[];
}

export interface Comparison {
  n: number;
  /** Mean of assist − reference (s); null with fewer than two differences. */
  biasS: number | null;
  sdS: number | null;
  lowerS: number | null;
  upperS: number | null;
  /** Shares in [0, 1] of differences within one frame interval and within the edition's tolerance. */
  withinFrame: number | null;
  withinTolerance: number | null;
}

export interface StudyGroup {
  key: string;
  n: number;
  clear: Comparison;
  time: Comparison;
}

export interface StudyReport {
  n: number;
  multiplier: number;
  againstAgreed: Record<StudyMeasure, Comparison>;
  againstUnassisted: Record<StudyMeasure, Comparison>;
  byMonth: StudyGroup[];
  byFrameRate: StudyGroup[];
  byResolution: StudyGroup[];
}

const value = (m: Marks, k: StudyMeasure) => (k === "dispense" ? m.dispenseS : k === "clear" ? m.clearS : m.clearS - m.dispenseS);

interface Difference {
  d: number;
  frameS: number;
  toleranceS: number;
}

export function compare(diffs: readonly Difference[]): Comparison {
  const n = diffs.length;
  const share = (ok: (x: Difference) => boolean) => (n ? diffs.filter(ok).length / n : null);
  // A hair of slack so a difference of exactly one frame, computed from pts, counts as within it.
  const within = (x: Difference, limit: number) => Math.abs(x.d) <= limit * (1 + 1e-9);
  const stats =
    n >= 2
      ? blandAltman(
          diffs.map((x) => x.d),
          new Array(n).fill(0),
          LIMITS_MULTIPLIER,
        )
      : null;
  return {
    n,
    biasS: stats?.bias ?? null,
    sdS: stats?.sd ?? null,
    lowerS: stats?.lower ?? null,
    upperS: stats?.upper ?? null,
    withinFrame: share((x) => within(x, x.frameS)),
    withinTolerance: share((x) => within(x, x.toleranceS)),
  };
}

function differences(drops: readonly StudyDrop[], k: StudyMeasure, against: "agreed" | "unassisted"): Difference[] {
  return drops.flatMap((drop) => {
    const refs = against === "agreed" ? [drop.agreed] : drop.unassisted;
    return refs.map((r) => ({ d: value(drop.assist, k) - value(r, k), frameS: drop.frameIntervalS, toleranceS: drop.toleranceS }));
  });
}

const byMeasure = (drops: readonly StudyDrop[], against: "agreed" | "unassisted") =>
  Object.fromEntries(STUDY_MEASURES.map((k) => [k, compare(differences(drops, k, against))])) as Record<StudyMeasure, Comparison>;

function groups(drops: readonly StudyDrop[], keyOf: (d: StudyDrop) => string): StudyGroup[] {
  const by = new Map<string, StudyDrop[]>();
  for (const d of drops) by.set(keyOf(d), [...(by.get(keyOf(d)) ?? []), d]);
  return [...by.entries()]
    .sort(([a], [b]) => a.localeCompare(b, "en", { numeric: true }))
    .map(([key, ds]) => ({ key, n: ds.length, clear: compare(differences(ds, "clear", "agreed")), time: compare(differences(ds, "time", "agreed")) }));
}

/** Frame rates are grouped to two decimals: 29.97 and 30 are different cameras' settings. */
export const frameRateKey = (fps: number) => `${Number(fps.toFixed(2))} fps`;
export const resolutionKey = (w: number, h: number) => `${w}×${h}`;

export function assistStudy(drops: readonly StudyDrop[]): StudyReport {
  return {
    n: drops.length,
    multiplier: LIMITS_MULTIPLIER,
    againstAgreed: byMeasure(drops, "agreed"),
    againstUnassisted: byMeasure(drops, "unassisted"),
    byMonth: groups(drops, (d) => d.settledAt.slice(0, 7)),
    byFrameRate: groups(drops, (d) => frameRateKey(d.fps)),
    byResolution: groups(drops, (d) => resolutionKey(d.width, d.height)),
  };
}
