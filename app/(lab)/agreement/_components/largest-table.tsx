import Link from "next/link";
import { milliseconds } from "@/lib/clips/words";
import { LocalTime } from "@/components/ui/local-time";
import type { AgreementReport } from "@/lib/agreement/hooks";
import { signedMs } from "./numbers";

const COLUMNS = ["Drop", "Submission", "Sample", "First reading", "Second reading", "First − second", "Settled"];

function Reader({ r }: { r: AgreementReport["largest"][number]["first"] }) {
  return (
    <>
      <span className="font-semibold tabular-nums">{milliseconds(r.timeS)}</span>
      <p className="text-xs text-ink-600">by {r.reviewerName}</p>
    </>
  );
}

/** The drops whose two readings lie furthest apart, largest first. */
export function LargestTable({ largest }: { largest: AgreementReport["largest"] }) {
  return (
    <section aria-labelledby="largest" className="space-y-2">
      <h2 id="largest" className="text-xl font-semibold">
        Largest disagreements
      </h2>
      <div className="overflow-x-auto rounded-lg border border-ink-100 bg-white shadow-sm">
        <table className="w-full text-left text-sm">
          <caption className="sr-only">The drops whose readings differ most, largest first</caption>
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
            {largest.map((p) => (
              <tr key={p.dropId} className="border-t border-ink-100 align-top">
                <th scope="row" className="whitespace-nowrap px-3 py-2">
                  <Link href={`/drops/${p.dropId}`} className="font-semibold text-wick-700 underline">
                    Drop {p.ordinal}
                    <span className="sr-only">
                      {" "}
                      of sample {p.sampleSerial}, {p.submissionReference}
                    </span>
                  </Link>
                </th>
                <td className="whitespace-nowrap px-3 py-2">{p.submissionReference}</td>
                <td className="whitespace-nowrap px-3 py-2">{p.sampleSerial}</td>
                <td className="whitespace-nowrap px-3 py-2">
                  <Reader r={p.first} />
                </td>
                <td className="whitespace-nowrap px-3 py-2">
                  <Reader r={p.second} />
                </td>
                <td className="whitespace-nowrap px-3 py-2 font-semibold tabular-nums">{signedMs(p.differenceS)}</td>
                <td className="whitespace-nowrap px-3 py-2">
                  <LocalTime iso={p.settledAt} />
                </td>
              </tr>
            ))}
            {largest.length === 0 && (
              <tr>
                <td colSpan={COLUMNS.length} className="px-3 py-6 text-center text-ink-600">
                  No drop was read twice in this period.
                </td>
              </tr>
            )}
          </tbody>
        </table>
      </div>
    </section>
  );
}
