"use client";

import { Notice } from "@/components/ui/notice";
import { useSubmission } from "@/lib/submissions/hooks";
import { AddSampleForm } from "./add-sample-form";
import { ImportSamplesForm } from "./import-samples-form";
import { RoundSamples } from "./round-samples";
import { SampleRequestsPanel } from "./sample-requests-panel";
import { SubmissionSummary } from "./submission-summary";

export function SubmissionDetail({ id, canEdit }: { id: string; canEdit: boolean }) {
  const q = useSubmission(id);
  if (q.isPending)
    return (
      <p className="text-ink-600" role="status">
        Loading the submission…
      </p>
    );
  if (q.isError) return <Notice tone="error">{q.error.message}</Notice>;
  if (q.data.view !== "staff") return <Notice tone="error">This page is for laboratory staff.</Notice>;
  const { submission, edition, rounds, flaggedRuns, signOff } = q.data;
  const sampleCount = rounds.reduce((n, r) => n + r.samples.length, 0);
  // A signed-off submission refuses new samples and runs until it is re-opened: no forms that would only be refused.
  const canChange = canEdit && !signOff.locked;

  return (
    <div className="space-y-8">
      <SubmissionSummary submission={submission} edition={edition} signOff={signOff} />
      {flaggedRuns > 0 && (
        <Notice tone="warn">
          <strong>
            {flaggedRuns} run{flaggedRuns === 1 ? " has" : "s have"} conditions outside the edition&apos;s limits.
          </strong>{" "}
          A lead must accept {flaggedRuns === 1 ? "it" : "each"} with a reason, or the conditions must be corrected, before the results count.
        </Notice>
      )}
      <section aria-labelledby="samples-heading" className="space-y-4">
        <h2 id="samples-heading" className="text-xl font-semibold">
          Samples
        </h2>
        {sampleCount === 0 && <p className="text-ink-600">No sample balls are recorded yet.</p>}
        {rounds.map((r) => (
          <RoundSamples key={r.round} round={r.round} samples={r.samples} canEdit={canChange} />
        ))}
      </section>
      {canChange && (
        <div className="grid gap-6 lg:grid-cols-2">
          <AddSampleForm submissionId={submission.id} currentRound={submission.currentRound} />
          <ImportSamplesForm submissionId={submission.id} currentRound={submission.currentRound} />
        </div>
      )}
      {/* After the sample forms: the requests load on their own, and must not push a form the technician is typing into. */}
      <SampleRequestsPanel
        submissionId={submission.id}
        currentRound={submission.currentRound}
        weights={submission.weightClassesLb}
        canEdit={canChange}
        waiting={submission.status === "awaiting_samples"}
      />
    </div>
  );
}
