"use client";

import Link from "next/link";
import { LocalTime } from "@/components/ui/local-time";
import { formatBytes } from "@/lib/numbers";
import type { ClipView } from "@/lib/clips/hooks";
import { ClipStatusBadge, clipProblem } from "@/components/clips/clip-status-badge";

/** The run's recordings, newest last, each with its state and, when refused, the reason in words. */
export function ClipList({ clips }: { clips: ClipView[] }) {
  if (clips.length === 0) return <p className="text-ink-600">No recordings are uploaded for this run yet.</p>;
  return (
    <div className="overflow-x-auto rounded-lg border border-ink-100 bg-white shadow-sm">
      <table className="w-full text-left text-sm">
        <caption className="sr-only">Recordings of this run</caption>
        <thead className="bg-ink-50 text-ink-600">
          <tr>
            <th scope="col" className="px-3 py-2">
              Recording
            </th>
            <th scope="col" className="px-3 py-2">
              Size
            </th>
            <th scope="col" className="px-3 py-2">
              Status
            </th>
            <th scope="col" className="px-3 py-2">
              Added
            </th>
          </tr>
        </thead>
        <tbody>
          {clips.map((c) => {
            const problem = clipProblem(c);
            return (
              <tr key={c.id} className="border-t border-ink-100 align-top">
                <th scope="row" className="px-3 py-2 font-normal">
                  <Link href={`/clips/${c.id}`} className="break-all font-semibold text-wick-700 underline">
                    {c.originalName}
                  </Link>
                  {c.duplicateOf && <span className="ml-2 text-xs font-semibold text-wick-700">duplicate of an earlier clip</span>}
                  {problem && <p className="mt-0.5 text-bad-700">{problem}</p>}
                </th>
                <td className="whitespace-nowrap px-3 py-2">{formatBytes(c.storedSize ?? c.declaredSize)}</td>
                <td className="px-3 py-2">
                  <ClipStatusBadge status={c.status} />
                </td>
                <td className="whitespace-nowrap px-3 py-2">
                  <LocalTime iso={c.createdAt} />
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
