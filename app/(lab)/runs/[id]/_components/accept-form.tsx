"use client";

import { useAcceptRun } from "@/lib/runs/hooks";
import { ReasonForm } from "./reason-form";

/** A lead's acceptance of flagged conditions: the reason is kept with the run for the audit. */
export function AcceptForm({ runId }: { runId: string }) {
  return (
    <ReasonForm
      mutation={useAcceptRun(runId)}
      labelledBy="accept-heading"
      className="space-y-3 rounded-lg border border-wick-300 bg-white p-5 shadow-sm"
      fieldId="accept-reason"
      label="Reason for accepting"
      submit="Accept anyway"
      pending="Accepting…"
    >
      <h3 id="accept-heading" className="text-lg font-semibold">
        Accept anyway
      </h3>
      <p className="text-sm text-ink-600">
        Accepting keeps the run in the results despite the warnings above. Your name, the time and the reason are recorded with it.
      </p>
    </ReasonForm>
  );
}
