// Round axis ends and evenly spaced ticks at 1, 2 or 5 × 10ⁿ, so every chart reads the same. Pure.

export interface NiceScale {
  domain: [number, number];
  ticks: number[];
  /** Formats a tick with just the decimals the step needs, and a true minus sign. */
  format: (v: number) => string;
}

function niceStep(rough: number): number {
  const power = 10 ** Math.floor(Math.log10(rough));
  const m = rough / power;
  return (m <= 1 ? 1 : m <= 2 ? 2 : m <= 5 ? 5 : 10) * power;
}

/** A scale covering every value with a little room, about `count` intervals wide. */
export function niceScale(values: readonly number[], count = 5): NiceScale {
  const finite = values.filter(Number.isFinite);
  let lo = finite.length ? Math.min(...finite) : 0;
  let hi = finite.length ? Math.max(...finite) : 1;
  if (hi === lo) {
    const half = Math.max(Math.abs(lo) * 0.1, 0.5);
    lo -= half;
    hi += half;
  }
  const room = (hi - lo) * 0.04;
  const step = niceStep((hi - lo + 2 * room) / count);
  const decimals = Math.max(0, -Math.floor(Math.log10(step) + 1e-9));
  const round = (v: number) => Number(v.toFixed(decimals));
  const start = round(Math.floor((lo - room) / step) * step);
  const end = round(Math.ceil((hi + room) / step) * step);
  const ticks: number[] = [];
  for (let i = 0; start + i * step <= end + step / 2; i++) ticks.push(round(start + i * step));
  const format = (v: number) => {
    const text = v.toFixed(decimals);
    return Number(text) === 0 ? (0).toFixed(decimals) : text.replace("-", "−");
  };
  return { domain: [start, end], ticks, format };
}
