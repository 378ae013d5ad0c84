"use client";

import type { ReactNode } from "react";
import { useSubmissionResults } from "@/lib/results/hooks";
import { KIND_LABELS } from "@/components/submissions/submission-labels";
import { Caution } from "@/components/shell/caution";
import { Notice } from "@/components/ui/notice";
import { BallTable } from "./ball-table";
import { DecisionPanel } from "./decision-panel";
import { Downloads } from "./downloads";
import { DropDotPlot } from "./drop-dot-plot";
import { EditionValues } from "./edition-values";
import { MeansDistribution } from "./means-distribution";
import { SurveillancePanel } from "./surveillance-panel";

/** `signOff` (for leads) sits under the decision it signs. */
export function ResultsPanel({ id, signOff }: { id: string; signOff?: ReactNode }) {
  const q = useSubmissionResults(id);
  if (q.isPending)
    return (
      <p className="text-ink-600" role="status">
        Computing the results…
      </p>
    );
  if (q.isError) return <Notice tone="error">{q.error.message}</Notice>;
  const r = q.data;
  const settled = r.balls.some((b) => b.drops.some((d) => d.settled));
  return (
    <div className="space-y-8">
      <header>
        <p className="text-sm font-semibold uppercase tracking-wide text-wick-700">
          Results · {KIND_LABELS[r.submission.kind]} submission {r.submission.reference}
        </p>
        <h1 className="text-3xl font-bold">{r.submission.modelName}</h1>
        <p className="text-ink-600">{r.submission.organisationName}</p>
      </header>
      <Downloads id={r.submission.id} />
      <Notice tone="warn">
        <Caution />
      </Notice>
      <DecisionPanel decision={r.decision} edition={r.edition} released={r.submission.status === "released"} />
      {signOff}
      {r.surveillance && <SurveillancePanel comparison={r.surveillance} />}
      <BallTable balls={r.balls} edition={r.edition} />
      {settled ? (
        <div className="grid gap-6 xl:grid-cols-2">
          <DropDotPlot balls={r.balls} edition={r.edition} />
          <MeansDistribution balls={r.balls} edition={r.edition} decision={r.decision} />
        </div>
      ) : (
        <p className="text-ink-600">The plots appear once a drop is settled.</p>
      )}
      <EditionValues edition={r.edition} />
    </div>
  );
}
