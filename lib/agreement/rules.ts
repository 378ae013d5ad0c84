import { blandAltman, intraclass } from "../stats/agreement";
import { meanAndSd } from "../stats/sample";

// How closely the lab's two blind readings of the same drops agree. Pure.

export interface ReaderTime {
  reviewerId: string;
  reviewerName: string;
  timeS: number;
}

/** One drop with both current readings submitted: slot 1 is `first`, slot 2 is `second`. */
export interface ReadingPair {
  dropId: string;
  submissionReference: string;
  sampleSerial: string;
  ordinal: number;
  first: ReaderTime;
  second: ReaderTime;
  /** The drop's agreed (or ruled) time, when it has one. */
  agreedS: number | null;
  /** When the later of the two readings was submitted (ISO 8601). */
  settledAt: string;
}

/** Limits of agreement are bias ± 1.96 sd: Bland & Altman (1986), Lancet 1(8476):307–310. */
export const LIMITS_MULTIPLIER = 1.96;
export const LARGEST_COUNT = 10;

export interface AgreementStatistics {
  /** Mean of first − second (s). */
  biasS: number;
  sdS: number;
  lowerS: number;
  upperS: number;
  multiplier: number;
  /**
   * ICC(1,1), the one-way random-effects intraclass correlation of single readings (Shrout & Fleiss
   * 1979, case 1): the first and second readings of a drop come from whichever reviewers took the
   * slots, so the readers differ from drop to drop, and the one-way model is the one that fits.
   * Null with a reason when undefined.
   */
  icc11: number | null;
  /** Which form `icc11` is, as the page names it. */
  iccForm: "ICC(1,1)";
  iccReason: string | null;
}

export interface ReviewerBias {
  reviewerId: string;
  reviewerName: string;
  /** Readings of drops that have an agreed value. */
  n: number;
  /** Mean of reading time − agreed value (s). */
  meanS: number | null;
  sdS: number | null;
}

export interface PairPoint {
  dropId: string;
  submissionReference: string;
  sampleSerial: string;
  ordinal: number;
  meanS: number;
  differenceS: number;
}

export interface LargestDisagreement extends ReadingPair {
  differenceS: number;
}

export interface AgreementSummary {
  n: number;
  statistics: AgreementStatistics | null;
  /** Why there are no statistics, in words. */
  reason: string | null;
  points: PairPoint[];
  reviewers: ReviewerBias[];
  largest: LargestDisagreement[];
}

/** The summary of one period, as the API returns it. */
export interface AgreementReport extends AgreementSummary {
  from: string;
  to: string;
  /** Set when the period held more pairs than are read at once: only the most recent count. */
  truncatedAt: number | null;
}

const difference = (p: ReadingPair) => p.first.timeS - p.second.timeS;

function statistics(pairs: readonly ReadingPair[]): AgreementStatistics {
  const ba = blandAltman(
    pairs.map((p) => p.first.timeS),
    pairs.map((p) => p.second.timeS),
    LIMITS_MULTIPLIER,
  );
  let icc11: number | null = null;
  let iccReason: string | null = null;
  try {
    // Rows are drops, columns the first and second reading (not two fixed raters: case 1).
    icc11 = intraclass(pairs.map((p) => [p.first.timeS, p.second.timeS])).single.oneWay;
  } catch {
    iccReason = "The intraclass correlation needs drops whose times differ from one another; every drop here has the same mean time.";
  }
  return { biasS: ba.bias, sdS: ba.sd, lowerS: ba.lower, upperS: ba.upper, multiplier: LIMITS_MULTIPLIER, icc11, iccForm: "ICC(1,1)", iccReason };
}

/** Each reviewer's readings against the drops' agreed values, over the drops that have one. */
export function reviewerBias(pairs: readonly ReadingPair[]): ReviewerBias[] {
  const by = new Map<string, { name: string; diffs: number[] }>();
  for (const p of pairs) {
    for (const r of [p.first, p.second]) {
      const entry = by.get(r.reviewerId) ?? { name: r.reviewerName, diffs: [] };
      if (p.agreedS !== null) entry.diffs.push(r.timeS - p.agreedS);
      by.set(r.reviewerId, entry);
    }
  }
  return [...by.entries()]
    .map(([reviewerId, { name, diffs }]) => {
      const n = diffs.length;
      const stats = n >= 2 ? meanAndSd(diffs) : null;
      return { reviewerId, reviewerName: name, n, meanS: n === 0 ? null : stats ? stats.mean : diffs[0], sdS: stats ? stats.sd : null };
    })
    .sort((a, b) => a.reviewerName.localeCompare(b.reviewerName) || a.reviewerId.localeCompare(b.reviewerId));
}

/** The pairs furthest apart, by |first − second|; ties keep the more recent first. */
export function largestDisagreements(pairs: readonly ReadingPair[], count = LARGEST_COUNT): LargestDisagreement[] {
  return pairs
    .map((p) => ({ ...p, differenceS: difference(p) }))
    .sort((a, b) => Math.abs(b.differenceS) - Math.abs(a.differenceS) || b.settledAt.localeCompare(a.settledAt) || a.dropId.localeCompare(b.dropId))
    .slice(0, count);
}

export function summariseAgreement(pairs: readonly ReadingPair[]): AgreementSummary {
  const n = pairs.length;
  const points = pairs.map((p) => ({
    dropId: p.dropId,
    submissionReference: p.submissionReference,
    sampleSerial: p.sampleSerial,
    ordinal: p.ordinal,
    meanS: (p.first.timeS + p.second.timeS) / 2,
    differenceS: difference(p),
  }));
  const reason =
    n === 0
      ? "No drop in this period has two submitted readings yet."
      : n === 1
        ? "Only one drop in this period has two submitted readings; agreement needs at least two."
        : null;
  return {
    n,
    statistics: reason ? null : statistics(pairs),
    reason,
    points,
    reviewers: reviewerBias(pairs),
    largest: largestDisagreements(pairs),
  };
}
