"use client";

import Link from "next/link";
import { LocalTime } from "@/components/ui/local-time";
import { Notice } from "@/components/ui/notice";
import { useWorkQueue, type QueueItem } from "@/lib/drops/hooks";
import { groupDigits } from "@/lib/clips/words";

const PROGRESS: Record<QueueItem["mine"], { words: string; style: string }> = {
  "not started": { words: "not started", style: "bg-ink-100 text-ink-800" },
  draft: { words: "draft saved", style: "bg-wick-100 text-wick-700" },
  correction: { words: "correction in progress", style: "bg-wick-100 text-wick-700" },
};

const COLUMNS = ["Drop", "Submission", "Sample", "Recording", "Start frame", "Waiting since", "Your progress"];

export function QueueTable() {
  const q = useWorkQueue();
  if (q.isPending)
    return (
      <p className="text-ink-600" role="status">
        Loading your queue…
      </p>
    );
  if (q.isError) return <Notice tone="error">{q.error.message}</Notice>;
  if (q.data.length === 0) return <Notice>No drops are waiting for your reading.</Notice>;
  const n = q.data.length;
  return (
    <div className="space-y-3">
      <p className="text-sm text-ink-600">
        {n} drop{n === 1 ? "" : "s"} waiting for your reading.
      </p>
      <div className="overflow-x-auto rounded-lg border border-ink-100 bg-white shadow-sm">
        <table className="w-full text-left text-sm">
          <caption className="sr-only">Drops waiting for your reading, the longest waiting first</caption>
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
            {q.data.map((i) => (
              <tr key={i.dropId} className="border-t border-ink-100 align-top">
                <th scope="row" className="whitespace-nowrap px-3 py-2">
                  <Link href={`/drops/${i.dropId}`} className="font-semibold text-wick-700 underline">
                    Drop {i.ordinal}
                    <span className="sr-only"> of sample {i.sampleSerial}</span>
                  </Link>
                </th>
                <td className="whitespace-nowrap px-3 py-2">
                  <Link href={`/submissions/${i.submissionId}`} className="text-wick-700 underline">
                    {i.submissionReference}
                  </Link>
                </td>
                <td className="whitespace-nowrap px-3 py-2">{i.sampleSerial}</td>
                <td className="break-all px-3 py-2">{i.clipName}</td>
                <td className="whitespace-nowrap px-3 py-2">{groupDigits(i.startFrame)}</td>
                <td className="whitespace-nowrap px-3 py-2">
                  <LocalTime iso={i.placedAt} />
                </td>
                <td className="px-3 py-2">
                  <span className={`whitespace-nowrap rounded-full px-2 py-0.5 text-xs font-semibold ${PROGRESS[i.mine].style}`}>{PROGRESS[i.mine].words}</span>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
