// How any number is written for people: a true minus sign, and enough decimals to stay on the
// right side of a limit. Pure; used by the pages, the report, the exports and the mail.

/** A number with a true minus sign (U+2212) when negative, never an ASCII hyphen. */
export function signed(v: number, digits: number): string {
  const t = v.toFixed(digits);
  return t.startsWith("-") ? (/^-0\.?0*$/.test(t) ? t.slice(1) : `\u2212${t.slice(1)}`) : t;
}

/**
 * How many decimals a value needs so that, rounded, it sits on the same side of every threshold
 * as the value itself: 134.96 against 135 needs two ("134.96", not "135.0"). At least `min`.
 */
export function digitsAgainst(v: number, thresholds: readonly number[], min = 1): number {
  // Twenty decimals tell apart any two doubles of a drop time's size.
  for (let d = min; d < 20; d++) {
    const shown = Number(v.toFixed(d));
    if (thresholds.every((t) => Math.sign(shown - t) === Math.sign(v - t))) return d;
  }
  return 20;
}

/** The decimals a value as set has: 135 → 0, 135.25 → 2. */
export function decimalsOf(v: number): number {
  return (String(v).split(".")[1] ?? "").length;
}

/** A byte count for people: "56 kB", "1.8 MB". */
export function formatBytes(n: number): string {
  if (n < 1024) return `${n} B`;
  const units = ["kB", "MB", "GB", "TB"];
  let v = n / 1024;
  let i = 0;
  while (v >= 1024 && i < units.length - 1) {
    v /= 1024;
    i++;
  }
  return `${v.toFixed(v < 10 ? 1 : 0)} ${units[i]}`;
}

/** Hours as "23 h 59 min", rounded down to the minute so a span never reads as reaching a limit it falls short of. */
export function hoursAndMinutes(hours: number): string {
  const minutes = Math.floor(hours * 60 + 1e-9);
  return `${Math.floor(minutes / 60)} h ${minutes % 60} min`;
}
