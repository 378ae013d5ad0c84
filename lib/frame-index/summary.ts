// What a frame index says about a recording: frame count, rate, whether the rate varies, keyframe spacing. Pure.

export interface Rational {
  num: number;
  den: number;
}

export interface IndexSummary {
  frameCount: number;
  firstPts: number;
  lastPts: number;
  averageRate: number;
  variableRate: boolean;
  maxKeyframeIntervalS: number;
}

/**
 * Summary of display-ordered pts. A clip counts as variable-rate when its frame intervals differ
 * by more than one tick and more than 1 % of the typical interval: a constant 30000/1001 rate in a
 * 1/1000 time base alternates 33 and 34 ticks and is still constant.
 */
export function summarizeIndex(pts: readonly number[], timeBase: Rational, keyframes: readonly number[]): IndexSummary {
  const n = pts.length;
  const tick = timeBase.num / timeBase.den;
  const deltas: number[] = [];
  for (let i = 1; i < n; i++) deltas.push(pts[i] - pts[i - 1]);
  const sorted = [...deltas].sort((a, b) => a - b);
  const median = sorted.length ? sorted[Math.floor(sorted.length / 2)] : 0;
  const spread = sorted.length ? sorted[sorted.length - 1] - sorted[0] : 0;
  const span = n > 1 ? (pts[n - 1] - pts[0]) * tick : 0;
  let maxKey = 0;
  const keys = [...keyframes].sort((a, b) => a - b);
  for (let i = 0; i < keys.length; i++) {
    const next = i + 1 < keys.length ? pts[keys[i + 1]] : pts[n - 1];
    maxKey = Math.max(maxKey, (next - pts[keys[i]]) * tick);
  }
  if (keys.length === 0 && n > 0) maxKey = span;
  return {
    frameCount: n,
    firstPts: n ? pts[0] : 0,
    lastPts: n ? pts[n - 1] : 0,
    averageRate: span > 0 ? (n - 1) / span : 0,
    variableRate: spread > 1 && spread > 0.01 * median,
    maxKeyframeIntervalS: maxKey,
  };
}
