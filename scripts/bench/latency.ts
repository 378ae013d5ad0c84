export interface LatencySummary {
  n: number;
  median: number;
  p95: number;
  max: number;
}

/** Nearest-rank percentiles of a list of latencies (ms). */
export function latencySummary(ms: readonly number[]): LatencySummary {
  const s = [...ms].sort((a, b) => a - b);
  const rank = (p: number) => s[Math.min(s.length - 1, Math.max(0, Math.ceil(p * s.length) - 1))];
  return { n: s.length, median: rank(0.5), p95: rank(0.95), max: s[s.length - 1] };
}
