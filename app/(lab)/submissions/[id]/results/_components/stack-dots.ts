// Stacked dots for a small sample: each value sits at its own x, piled on the others of its bin.

/** A round bin width giving about eight bins over the values' range. */
export function binWidth(values: number[]): number {
  if (values.length < 2) return 1;
  const range = Math.max(...values) - Math.min(...values);
  if (!(range > 0)) return 1;
  const raw = range / 8;
  const p = 10 ** Math.floor(Math.log10(raw));
  return [1, 2, 5, 10].map((m) => m * p).find((w) => w >= raw) ?? 10 * p;
}

export function stackDots(values: { serial: string; value: number }[]): { dots: { x: number; y: number; serial: string }[]; bin: number } {
  const bin = binWidth(values.map((v) => v.value));
  const heights = new Map<number, number>();
  const dots = [...values]
    .sort((a, b) => a.value - b.value)
    .map((v) => {
      const k = Math.floor(v.value / bin);
      const y = (heights.get(k) ?? 0) + 1;
      heights.set(k, y);
      return { x: v.value, y: y - 0.5, serial: v.serial };
    });
  return { dots, bin };
}
