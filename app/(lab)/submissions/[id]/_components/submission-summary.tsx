"use client";

import Link from "next/link";
import { formatDay } from "@/components/ui/dates";
import { DetailList } from "@/components/ui/detail-list";
import { editionInBrief } from "@/lib/editions/words";
import type { StaffSubmissionDetail } from "@/lib/submissions/view";
import { KIND_LABELS, StatusBadge } from "@/components/submissions/submission-labels";

const link = "font-semibold text-wick-700 underline";

export function SubmissionSummary({ submission: s, edition, signOff }: Pick<StaffSubmissionDetail, "submission" | "edition" | "signOff">) {
  const items = [
    { label: "Organisation", value: s.organisationName },
    { label: "Kind", value: KIND_LABELS[s.kind] },
    { label: "Status", value: <StatusBadge status={s.status} /> },
    { label: "Current round", value: s.currentRound },
    { label: "Results revision", value: `${signOff.revision}${signOff.locked ? " (signed off)" : ""}` },
    { label: "Received", value: formatDay(s.receivedOn) },
    {
      label: "Specification edition",
      value: (
        <Link href={`/editions/${edition.id}`} className={link}>
          {edition.name}
        </Link>
      ),
    },
    { label: "Weight classes", value: s.weightClassesLb.length ? s.weightClassesLb.map((lb) => `${lb} lb`).join(", ") : "not given" },
    ...(s.approvalSubmissionId
      ? [
          {
            label: "Approval submission",
            value: (
              <Link href={`/submissions/${s.approvalSubmissionId}`} className={link}>
                {s.approvalReference}
              </Link>
            ),
          },
        ]
      : []),
  ];
  return (
    <header className="space-y-4 rounded-lg border border-ink-100 bg-white p-5 shadow-sm">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <p className="text-sm font-semibold uppercase tracking-wide text-wick-700">Submission {s.reference}</p>
          <h1 className="text-3xl font-bold">{s.modelName}</h1>
        </div>
        <Link href={`/submissions/${s.id}/results`} className="rounded-md bg-wick-600 px-4 py-2 font-semibold text-white hover:bg-wick-700">
          Results and decision
        </Link>
      </div>
      {signOff.locked && (
        <p data-testid="lock-notice" className="rounded-md bg-ok-100 px-3 py-2 text-sm font-semibold text-ok-700">
          Locked: signed off as revision {signOff.revision}. Readings, rulings, runs and samples cannot be changed until a lead re-opens it.
        </p>
      )}
      <DetailList items={items} />
      <p className="text-sm text-ink-600">Judged against {editionInBrief(edition)}</p>
      {s.notes && <p className="whitespace-pre-wrap text-sm text-ink-800">{s.notes}</p>}
    </header>
  );
}
