"use client";

import { formatDay } from "@/components/ui/dates";
import { DetailList } from "@/components/ui/detail-list";
import { Notice } from "@/components/ui/notice";
import { KIND_LABELS, StatusBadge } from "@/components/submissions/submission-labels";
import { useSubmission } from "@/lib/submissions/hooks";
import { PortalResults } from "./portal-results";
import { PortalSampleRequests } from "./portal-sample-requests";

export function PortalSubmission({ id }: { id: string }) {
  const q = useSubmission(id);
  if (q.isPending)
    return (
      <p className="text-ink-600" role="status">
        Loading the submission…
      </p>
    );
  if (q.isError) return <Notice tone="error">{q.error.message}</Notice>;
  if (q.data.view !== "manufacturer")
    return <Notice tone="error">This page is for manufacturers; laboratory staff open submissions from the lab pages.</Notice>;
  const s = q.data;
  const items = [
    { label: "Kind", value: KIND_LABELS[s.kind] },
    { label: "Status", value: <StatusBadge status={s.status} /> },
    { label: "Current round", value: s.currentRound },
    { label: "Received", value: formatDay(s.receivedOn) },
    { label: "Weight classes", value: s.weightClassesLb.length ? s.weightClassesLb.map((lb) => `${lb} lb`).join(", ") : "not given" },
    { label: "Judged against", value: s.editionName },
  ];
  return (
    <div className="space-y-6">
      <header className="space-y-4 rounded-lg border border-ink-100 bg-white p-5 shadow-sm">
        <div>
          <p className="text-sm font-semibold uppercase tracking-wide text-wick-700">Submission {s.reference}</p>
          <h1 className="text-3xl font-bold">{s.modelName}</h1>
        </div>
        <DetailList items={items} />
      </header>
      <PortalResults id={s.id} />
      <section aria-labelledby="rounds-heading" className="space-y-2">
        <h2 id="rounds-heading" className="text-xl font-semibold">
          Samples received
        </h2>
        {s.samplesByRound.length === 0 ? (
          <p className="text-ink-600">The laboratory has not logged any sample balls of this submission yet.</p>
        ) : (
          <div className="overflow-x-auto rounded-lg border border-ink-100 bg-white shadow-sm">
            <table className="w-full text-left text-sm">
              <caption className="sr-only">Sample balls received, by round</caption>
              <thead className="bg-ink-50 text-ink-600">
                <tr>
                  <th scope="col" className="px-3 py-2">
                    Round
                  </th>
                  <th scope="col" className="px-3 py-2">
                    Sample balls
                  </th>
                </tr>
              </thead>
              <tbody>
                {s.samplesByRound.map((r) => (
                  <tr key={r.round} className="border-t border-ink-100">
                    <th scope="row" className="px-3 py-2 font-semibold">
                      Round {r.round}
                    </th>
                    <td className="px-3 py-2">{r.count}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        )}
      </section>
      <PortalSampleRequests submissionId={s.id} />
    </div>
  );
}
