"use client";

import Link from "next/link";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { ConditionWarnings } from "@/components/ui/condition-warnings";
import { formatInstant } from "@/components/ui/dates";
import { Notice } from "@/components/ui/notice";
import { useRun, type RunDetail as RunDetailData } from "@/lib/runs/hooks";
import { AcceptForm } from "./accept-form";
import { Drops } from "./drops";
import { EditRun } from "./edit-run";
import { Recordings } from "./recordings";
import { RunConditions } from "./run-conditions";
import { VoidForm } from "./void-form";

export function RunDetail({ id, canEdit, isLead, isReviewer }: { id: string; canEdit: boolean; isLead: boolean; isReviewer: boolean }) {
  const q = useRun(id);
  const [editing, setEditing] = useState(false);
  if (q.isPending)
    return (
      <p className="text-ink-600" role="status">
        Loading the run…
      </p>
    );
  if (q.isError) return <Notice tone="error">{q.error.message}</Notice>;
  const run = q.data;
  // A signed-off submission, or a voided run, takes no change: no form that would only be refused.
  const open = !run.lockedReason && !run.voidedAt;
  const canChange = canEdit && open;

  return (
    <div className="space-y-6">
      <div>
        <Link href={`/submissions/${run.submissionId}`} className="text-sm font-semibold text-wick-700 underline">
          Back to the submission
        </Link>
        <p className="mt-2 text-sm font-semibold uppercase tracking-wide text-wick-700">Sample {run.sampleSerial}</p>
        <h1 className="text-3xl font-bold">Run tested {formatInstant(run.testedAt)}</h1>
        <p className="mt-1 text-ink-600">
          Recorded by {run.technicianName} · {run.dropCount} drop{run.dropCount === 1 ? "" : "s"}
        </p>
      </div>
      <RunNotices run={run} />

      <section aria-labelledby="warnings-heading" className="space-y-3">
        <h2 id="warnings-heading" className="text-xl font-semibold">
          Condition checks
        </h2>
        <ConditionWarnings run={run} showWhen />
        {run.needsAcceptance && (
          <Notice tone="warn">
            These conditions are outside the edition&apos;s limits. The run counts only once a lead accepts it with a reason, or once its conditions are
            corrected.
          </Notice>
        )}
        {isLead && open && run.needsAcceptance && <AcceptForm runId={run.id} />}
      </section>

      {editing && canChange ? (
        <section aria-labelledby="edit-heading" className="space-y-3">
          <div className="flex flex-wrap items-center justify-between gap-3">
            <h2 id="edit-heading" className="text-xl font-semibold">
              Edit conditions
            </h2>
            <Button kind="secondary" onClick={() => setEditing(false)}>
              Cancel editing
            </Button>
          </div>
          <EditRun run={run} onSaved={() => setEditing(false)} />
        </section>
      ) : (
        <section aria-labelledby="conditions-heading" className="space-y-3 rounded-lg border border-ink-100 bg-white p-5 shadow-sm">
          <div className="flex flex-wrap items-center justify-between gap-3">
            <h2 id="conditions-heading" className="text-xl font-semibold">
              Conditions
            </h2>
            {canChange && (
              <Button kind="secondary" onClick={() => setEditing(true)}>
                Edit conditions
              </Button>
            )}
          </div>
          <RunConditions run={run} />
        </section>
      )}

      <Recordings runId={run.id} canUpload={canChange} />

      <Drops runId={run.id} canEdit={canChange} canRead={isReviewer} />

      {isLead && open && <VoidForm runId={run.id} />}
    </div>
  );
}

/** Why the run's forms are closed: its submission is signed off, or the run is voided. */
function RunNotices({ run }: { run: RunDetailData }) {
  return (
    <>
      {run.lockedReason && (
        <div data-testid="run-lock-notice">
          <Notice tone="info">{run.lockedReason} Nothing on this page can change until then.</Notice>
        </div>
      )}
      {run.voidedAt && (
        <div data-testid="void-notice">
          <Notice tone="warn">
            <strong>
              Voided by {run.voidedByName} on {formatInstant(run.voidedAt)}.
            </strong>{" "}
            It no longer counts. Reason: {run.voidReason}
          </Notice>
        </div>
      )}
    </>
  );
}
