import { milliseconds } from "@/lib/clips/words";
import type { AgreementReport } from "@/lib/agreement/hooks";
import { signedMs } from "./numbers";

const COLUMNS = ["Reviewer", "Drops with an agreed value", "Mean bias (reading − agreed)", "Standard deviation"];

/** Each reviewer's readings against the drops' agreed values. */
export function ReviewerBiasTable({ reviewers }: { reviewers: AgreementReport["reviewers"] }) {
  return (
    <section aria-labelledby="reviewer-bias" className="space-y-2">
      <h2 id="reviewer-bias" className="text-xl font-semibold">
        Each reviewer against the agreed value
      </h2>
      <p className="max-w-3xl text-sm text-ink-600">
        Over the drops of the period that have an agreed or ruled time; a positive bias means the reviewer&apos;s times run long.
      </p>
      <div className="overflow-x-auto rounded-lg border border-ink-100 bg-white shadow-sm">
        <table className="w-full text-left text-sm">
          <caption className="sr-only">Each reviewer&apos;s mean bias against the agreed value</caption>
          <thead className="bg-ink-50 text-ink-600">
            <tr>
              {COLUMNS.map((c) => (
                <th key={c} scope="col" className="px-3 py-2">
                  {c}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {reviewers.map((r) => (
              <tr key={r.reviewerId} className="border-t border-ink-100">
                <th scope="row" className="px-3 py-2 font-semibold">
                  {r.reviewerName}
                </th>
                <td className="px-3 py-2 tabular-nums">{r.n}</td>
                <td className="px-3 py-2 tabular-nums">{r.meanS === null ? "—" : signedMs(r.meanS)}</td>
                <td className="px-3 py-2 tabular-nums">{r.sdS === null ? "—" : milliseconds(r.sdS)}</td>
              </tr>
            ))}
            {reviewers.length === 0 && (
              <tr>
                <td colSpan={COLUMNS.length} className="px-3 py-6 text-center text-ink-600">
                  No reviewer has a drop read twice in this period.
                </td>
              </tr>
            )}
          </tbody>
        </table>
      </div>
    </section>
  );
}
