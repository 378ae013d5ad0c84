"use client";

import { useVoidRun } from "@/lib/runs/hooks";
import { ReasonForm } from "./reason-form";

/** A lead voids a run that must not count. Final: the run stays on record, shown as voided. */
export function VoidForm({ runId }: { runId: string }) {
  return (
    <section aria-labelledby="void-heading" className="rounded-lg border border-ink-100 bg-white p-5 shadow-sm">
      <ReasonForm
        mutation={useVoidRun(runId)}
        className="space-y-3"
        fieldId="void-reason"
        label="Reason for voiding"
        submit="Void this run"
        pending="Voiding…"
        confirm="Void this run? It will no longer count, and a void cannot be undone. Record a new run if the ball is to be tested again."
        danger
      >
        <h2 id="void-heading" className="text-xl font-semibold">
          Void this run
        </h2>
        <p className="max-w-3xl text-sm text-ink-600">
          For a run that must not count, such as one recorded on the wrong ball. The run and its drops stay on record, marked voided with your name, the time
          and the reason; the ball&apos;s run before it counts again. A void cannot be undone.
        </p>
      </ReasonForm>
    </section>
  );
}
