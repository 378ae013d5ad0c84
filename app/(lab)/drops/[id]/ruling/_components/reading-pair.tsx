"use client";

import { countingReadings } from "@/lib/readings/rules";
import { milliseconds as s } from "@/lib/clips/words";
import type { DropView, ReadingView } from "@/lib/drops/hooks";
import { signedSeconds } from "@/app/(lab)/discrepancies/_components/reading-numbers";

function Column({ title, r, onJump }: { title: string; r: ReadingView | undefined; onJump: (f: number) => void }) {
  if (!r)
    return (
      <section className="rounded-lg border border-ink-100 bg-white p-4">
        <h3 className="font-semibold">{title}</h3>
        <p className="text-ink-600">—</p>
      </section>
    );
  const frame = (label: string, f: number | null) => (
    <div className="flex items-baseline justify-between gap-2">
      <dt className="text-ink-600">{label}</dt>
      <dd>
        {f === null ? (
          "—"
        ) : (
          <button type="button" className="font-mono font-semibold underline" onClick={() => onJump(f)}>
            frame {f}
          </button>
        )}
      </dd>
    </div>
  );
  return (
    <section aria-label={title} className="rounded-lg border border-ink-100 bg-white p-4 shadow-sm">
      <h3 className="font-semibold">{title}</h3>
      <p className="text-sm text-ink-600">by {r.reviewerName}</p>
      <dl className="mt-2 space-y-1 text-sm">
        {frame("Dispense", r.dispenseFrame)}
        {frame("Clear", r.clearFrame)}
        <div className="flex items-baseline justify-between gap-2">
          <dt className="text-ink-600">Drop time</dt>
          <dd className="font-mono font-semibold">{r.timeS === null ? "—" : `${s(r.timeS)}${r.uncertainty ? ` ± ${s(r.uncertainty.expanded)}` : ""}`}</dd>
        </div>
      </dl>
    </section>
  );
}

/** The two readings that disagree, side by side, with the difference between them. */
export function ReadingPair({ drop, onJump }: { drop: DropView; onJump: (f: number) => void }) {
  const current = countingReadings(drop.readings);
  const c = drop.comparison;
  return (
    <div className="space-y-3">
      <div className="grid gap-4 md:grid-cols-2">
        <Column title="First reading" r={current.find((r) => r.slot === 1)} onJump={onJump} />
        <Column title="Second reading" r={current.find((r) => r.slot === 2)} onJump={onJump} />
      </div>
      {c && (
        <p className="text-sm" data-testid="difference">
          Difference (second − first): <strong>{signedSeconds(c.timeDifferenceS)}</strong> in the drop time; dispense {signedSeconds(c.dispenseDifferenceS)},
          clear {signedSeconds(c.clearDifferenceS)}. The edition&apos;s tolerance is ±{s(drop.readingToleranceS)}.
        </p>
      )}
    </div>
  );
}
