"use client";

import Link from "next/link";
import { formatDay } from "@/components/ui/dates";
import { Notice } from "@/components/ui/notice";
import { useEditions } from "@/lib/editions/hooks";
import { displayValue } from "./edition-fields";

const COLUMNS = ["Edition", "Effective from", "Minimum absorption time", "Criterion", "Drops per ball", "Guard band", "Round sizes", "Used by"];

export function EditionsTable() {
  const q = useEditions();
  if (q.isPending)
    return (
      <p className="text-ink-600" role="status">
        Loading editions…
      </p>
    );
  if (q.isError) return <Notice tone="error">{q.error.message}</Notice>;
  if (q.data.length === 0) return <p className="text-ink-600">No edition yet. A lead must create one before any submission can be logged.</p>;
  return (
    <div className="overflow-x-auto rounded-lg border border-ink-100 bg-white shadow-sm">
      <table className="w-full text-left text-sm">
        <caption className="sr-only">Specification editions, newest first</caption>
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
          {q.data.map((e) => (
            <tr key={e.id} className="border-t border-ink-100">
              <th scope="row" className="px-3 py-2">
                <Link href={`/editions/${e.id}`} className="font-semibold text-wick-700 underline">
                  {e.name}
                </Link>
              </th>
              <td className="whitespace-nowrap px-3 py-2">{formatDay(e.effectiveFrom)}</td>
              <td className="px-3 py-2">{displayValue(e, "minAbsorptionS")}</td>
              <td className="px-3 py-2">{displayValue(e, "criterion")}</td>
              <td className="px-3 py-2">{e.dropsPerBall}</td>
              <td className="px-3 py-2">{displayValue(e, "guardBandS")}</td>
              <td className="px-3 py-2">{displayValue(e, "roundSizes")}</td>
              <td className="px-3 py-2">
                {e.submissionCount} submission{e.submissionCount === 1 ? "" : "s"}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
