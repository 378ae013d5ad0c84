import { milliseconds } from "@/lib/clips/words";
import { signed } from "@/lib/numbers";

/** A signed time to the millisecond, with a real minus sign: "+0.033 s", "−1.200 s". */
export function signedMs(s: number): string {
  const text = milliseconds(Math.abs(s));
  if (text === "0.000 s") return text;
  return `${s > 0 ? "+" : "−"}${text}`;
}

/** A number for the chart's table, to the millisecond, minus sign included. */
export const tableMs = (s: number) => signed(s, 3);
