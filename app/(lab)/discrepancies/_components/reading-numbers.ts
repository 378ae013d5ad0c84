import type { DropView, ReadingView } from "@/app/_client/drops";
import { seconds } from "@/app/_client/clip-words";

/** The two readings that count, first then second: later corrections replace earlier ones. */
export function countingReadings(d: DropView): ReadingView[] {
  return d.readings.filter((r) => r.status === "submitted" && !r.superseded).sort((a, b) => (a.slot ?? 0) - (b.slot ?? 0));
}

/** A difference with its sign, so the reader sees which reading is longer: "+1.2 s", "−0.04 s", "0 s". */
export function signedSeconds(s: number): string {
  const text = seconds(Math.abs(s));
  if (text === "0 s") return text;
  return `${s > 0 ? "+" : "−"}${text}`;
}
