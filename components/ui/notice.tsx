import type { ReactNode } from "react";

const TONES = {
  error: "border-bad-700 bg-bad-100 text-bad-700",
  warn: "border-wick-600 bg-wick-100 text-ink-900",
  ok: "border-ok-700 bg-ok-100 text-ok-700",
  info: "border-ink-200 bg-ink-50 text-ink-800",
} as const;

export function Notice({ tone = "info", children }: { tone?: keyof typeof TONES; children: ReactNode }) {
  return (
    <div role={tone === "error" ? "alert" : "status"} className={`rounded-md border-l-4 px-4 py-3 text-sm ${TONES[tone]}`}>
      {children}
    </div>
  );
}
