import { seconds } from "@/lib/clips/words";

/** A difference with its sign, so the reader sees which reading is longer: "+1.2 s", "−0.04 s", "0 s". */
export function signedSeconds(s: number): string {
  const text = seconds(Math.abs(s));
  if (text === "0 s") return text;
  return `${s > 0 ? "+" : "−"}${text}`;
}
