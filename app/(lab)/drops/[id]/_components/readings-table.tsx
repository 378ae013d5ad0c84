import { milliseconds } from "@/lib/clips/words";
import type { DropView } from "@/lib/drops/hooks";
import { LocalTime } from "@/components/ui/local-time";

const s = (v: number | null | undefined) => (v === null || v === undefined ? "—" : milliseconds(v));

/** Every reading the viewer may see, superseded ones included, and how the two that count compare. */
export function ReadingsTable({ drop, onJump }: { drop: DropView; onJump: (frame: number) => void }) {
  if (drop.readings.length === 0) return null;
  const jump = (f: number | null) =>
    f === null ? (
      "—"
    ) : (
      <button type="button" className="font-mono underline" onClick={() => onJump(f)} aria-label={`Go to frame ${f}`}>
        {f}
      </button>
    );
  return (
    <section aria-labelledby="readings-heading" className="space-y-3 rounded-lg border border-ink-100 bg-white p-5 shadow-sm">
      <h2 id="readings-heading" className="text-xl font-semibold">
        {drop.blind ? "Your reading's history" : "Readings"}
      </h2>
      <div className="overflow-x-auto">
        <table className="w-full text-left text-sm">
          <thead className="border-b border-ink-100 text-ink-600">
            <tr>
              {!drop.blind && (
                <th scope="col" className="py-2 pr-4">
                  Reading
                </th>
              )}
              <th scope="col" className="py-2 pr-4">
                Reviewer
              </th>
              <th scope="col" className="py-2 pr-4">
                Dispense frame
              </th>
              <th scope="col" className="py-2 pr-4">
                Clear frame
              </th>
              <th scope="col" className="py-2 pr-4">
                Drop time
              </th>
              <th scope="col" className="py-2 pr-4">
                Uncertainty (k = 2)
              </th>
              <th scope="col" className="py-2 pr-4">
                Status
              </th>
            </tr>
          </thead>
          <tbody>
            {drop.readings.map((r) => (
              <tr key={r.id} className={`border-b border-ink-50 ${r.superseded ? "text-ink-400 line-through decoration-ink-300" : ""}`}>
                {!drop.blind && <td className="py-2 pr-4">{r.slot === 1 ? "First" : "Second"}</td>}
                <td className="py-2 pr-4">{r.reviewerName}</td>
                <td className="py-2 pr-4">{jump(r.dispenseFrame)}</td>
                <td className="py-2 pr-4">{jump(r.clearFrame)}</td>
                <td className="py-2 pr-4 font-mono">{s(r.timeS)}</td>
                <td className="py-2 pr-4 font-mono">{r.uncertainty ? `± ${milliseconds(r.uncertainty.expanded)}` : "—"}</td>
                <td className="py-2 pr-4 no-underline">
                  {r.superseded ? "Superseded by a correction" : r.status === "draft" ? "Draft" : "Submitted"}
                  {r.submittedAt && (
                    <>
                      {" "}
                      · <LocalTime iso={r.submittedAt} />
                    </>
                  )}
                  {r.correctionReason && <span className="block text-xs text-ink-600">Correction: {r.correctionReason}</span>}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {drop.comparison && (
        <p className="text-sm text-ink-800">
          The two readings differ by {s(drop.comparison.timeDifferenceS)} on the drop time, {s(drop.comparison.dispenseDifferenceS)} on the dispense mark and{" "}
          {s(drop.comparison.clearDifferenceS)} on the clear mark (tolerance {drop.readingToleranceS} s).{" "}
          {drop.comparison.agreedTimeS !== null ? (
            <strong>Agreed drop time {s(drop.comparison.agreedTimeS)}, the mean of the two.</strong>
          ) : (
            <strong>They disagree: a lead rules on this drop.</strong>
          )}
        </p>
      )}
    </section>
  );
}
