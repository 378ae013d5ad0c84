"use client";

import Link from "next/link";
import { LocalTime } from "@/components/ui/local-time";
import { Notice } from "@/components/ui/notice";
import { useDiscrepancies, type DropView } from "@/lib/drops/hooks";
import { seconds } from "@/lib/clips/words";
import { countingReadings } from "@/lib/readings/rules";
import { signedSeconds } from "./reading-numbers";

const COLUMNS = ["Drop", "Submission", "Sample", "First reading", "Second reading", "Difference (second − first)", "Tolerance", "Since", "Ruling"];

function Reading({ r }: { r: DropView["readings"][number] | undefined }) {
  if (!r || r.timeS === null) return <span className="text-ink-600">—</span>;
  return (
    <>
      <span className="font-semibold">{seconds(r.timeS)}</span>
      <p className="text-xs text-ink-600">by {r.reviewerName}</p>
    </>
  );
}

export function DiscrepancyTable() {
  const q = useDiscrepancies();
  if (q.isPending)
    return (
      <p className="text-ink-600" role="status">
        Loading the discrepancies…
      </p>
    );
  if (q.isError) return <Notice tone="error">{q.error.message}</Notice>;
  if (q.data.length === 0) return <Notice>No drop has readings that disagree.</Notice>;
  return (
    <div className="overflow-x-auto rounded-lg border border-ink-100 bg-white shadow-sm">
      <table className="w-full text-left text-sm">
        <caption className="sr-only">Drops whose readings disagree, the oldest first</caption>
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
          {q.data.map((d) => {
            const [first, second] = countingReadings(d.readings);
            const c = d.comparison;
            return (
              <tr key={d.id} className="border-t border-ink-100 align-top">
                <th scope="row" className="whitespace-nowrap px-3 py-2">
                  <Link href={`/drops/${d.id}`} className="font-semibold text-wick-700 underline">
                    Drop {d.ordinal}
                    <span className="sr-only"> of sample {d.sampleSerial}</span>
                  </Link>
                </th>
                <td className="whitespace-nowrap px-3 py-2">
                  <Link href={`/submissions/${d.submissionId}`} className="text-wick-700 underline">
                    {d.submissionReference}
                  </Link>
                </td>
                <td className="whitespace-nowrap px-3 py-2">{d.sampleSerial}</td>
                <td className="whitespace-nowrap px-3 py-2">
                  <Reading r={first} />
                </td>
                <td className="whitespace-nowrap px-3 py-2">
                  <Reading r={second} />
                </td>
                <td className="whitespace-nowrap px-3 py-2">
                  {c ? (
                    <>
                      <span className="font-semibold">{signedSeconds(c.timeDifferenceS)}</span>
                      <p className="text-xs text-ink-600">
                        dispense {signedSeconds(c.dispenseDifferenceS)} · clear {signedSeconds(c.clearDifferenceS)}
                      </p>
                    </>
                  ) : (
                    "—"
                  )}
                </td>
                <td className="whitespace-nowrap px-3 py-2">±{seconds(d.readingToleranceS)}</td>
                <td className="whitespace-nowrap px-3 py-2">{d.stateChangedAt ? <LocalTime iso={d.stateChangedAt} /> : "—"}</td>
                <td className="whitespace-nowrap px-3 py-2">
                  <Link href={`/drops/${d.id}/ruling`} className="font-semibold text-wick-700 underline">
                    Rule
                    <span className="sr-only">
                      {" "}
                      on drop {d.ordinal} of sample {d.sampleSerial}
                    </span>
                  </Link>
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
