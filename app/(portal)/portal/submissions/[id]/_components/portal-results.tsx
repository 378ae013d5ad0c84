"use client";

import { useQuery } from "@tanstack/react-query";
import { Downloads } from "@/components/reports/report-downloads";
import { s1, sJudged, useSubmissionResults } from "@/lib/results/hooks";
import { Caution } from "@/components/shell/caution";
import { DetailList } from "@/components/ui/detail-list";
import { LocalTime } from "@/components/ui/local-time";
import { Notice } from "@/components/ui/notice";
import { fetchJson } from "@/lib/http/client";
import type { ReleaseView } from "@/lib/signoff/release";

// The manufacturer's view of its results: nothing until a lead signs them off; then the decision,
// the per-ball table, the signature and the report and exports to download.

const BALL_WORDS = { meets: "clear of the guard band", close: "close to the limit", below: "below the minimum", pending: "waiting" } as const;

function Released({ id, release }: { id: string; release: ReleaseView }) {
  const q = useSubmissionResults(id);
  if (q.isPending)
    return (
      <p className="text-ink-600" role="status">
        Loading the results…
      </p>
    );
  if (q.isError) return <Notice tone="error">{q.error.message}</Notice>;
  const { decision: d, balls, edition } = q.data;
  const g = release.signature!;
  return (
    <>
      <div className="space-y-2">
        <p className="text-lg">
          Decision after round {d.round}: <strong data-testid="portal-decision">{d.decision}</strong>
        </p>
        <p className="max-w-4xl text-ink-900">{d.explanation}</p>
        <p className="text-sm text-ink-600">
          Judged against {edition.name}: minimum absorption time {edition.minAbsorptionS} s.
        </p>
      </div>
      <DetailList
        items={[
          { label: "Signed off by", value: g.signedBy },
          { label: "When", value: <LocalTime iso={g.signedAt} /> },
          { label: "Meaning", value: g.meaning },
          { label: "Revision", value: g.revision },
        ]}
      />
      <Downloads id={id} />
      <div className="overflow-x-auto rounded-lg border border-ink-100">
        <table className="w-full text-left text-sm">
          <caption className="sr-only">Results of each sample ball</caption>
          <thead className="bg-ink-50 text-ink-600">
            <tr>
              {["Ball", "Round", "Drops", "Mean", "SD", "Shortest drop", "Result"].map((h) => (
                <th key={h} scope="col" className="px-3 py-2">
                  {h}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {balls.map((b) => (
              <tr key={b.sampleId} className="border-t border-ink-100">
                <th scope="row" className="px-3 py-2 font-semibold">
                  {b.serial}
                </th>
                <td className="px-3 py-2">{b.round}</td>
                <td className="px-3 py-2">{b.n}</td>
                <td className="px-3 py-2 tabular-nums">{edition.criterion === "every_drop" ? s1(b.mean) : sJudged(b.mean, edition)}</td>
                <td className="px-3 py-2 tabular-nums">{b.sd === null ? "—" : `${b.sd.toFixed(2)} s`}</td>
                <td className="px-3 py-2 tabular-nums">
                  {edition.criterion === "every_drop" ? sJudged(b.min, edition, 3) : b.min === null ? "—" : `${b.min.toFixed(3)} s`}
                </td>
                <td className="px-3 py-2">{BALL_WORDS[b.status]}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </>
  );
}

export function PortalResults({ id }: { id: string }) {
  const q = useQuery({ queryKey: ["release", id], queryFn: () => fetchJson<ReleaseView>(`/api/submissions/${id}/release`) });
  return (
    <section aria-labelledby="results-heading" className="space-y-4 rounded-lg border border-ink-100 bg-white p-5 shadow-sm">
      <h2 id="results-heading" className="text-xl font-semibold">
        Results and test report
      </h2>
      {q.isPending && (
        <p className="text-ink-600" role="status">
          Loading…
        </p>
      )}
      {q.isError && <Notice tone="error">{q.error.message}</Notice>}
      {q.data && q.data.state === "released" && <Released id={id} release={q.data} />}
      {q.data && q.data.state !== "released" && (
        <p className="text-ink-800" data-testid="release-state">
          {q.data.message}
          {q.data.signature && (
            <>
              {" "}
              Revision {q.data.signature.revision} was signed off by {q.data.signature.signedBy} on <LocalTime iso={q.data.signature.signedAt} />.
            </>
          )}
        </p>
      )}
      <Notice tone="warn">
        <Caution compact />
      </Notice>
    </section>
  );
}
