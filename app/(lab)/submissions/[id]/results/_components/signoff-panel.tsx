"use client";

import Link from "next/link";
import { useSignOff } from "@/lib/signoff/hooks";
import { Notice } from "@/components/ui/notice";
import { ReopenForm } from "./reopen-form";
import { SignForm } from "./sign-form";
import { SignoffHistory } from "./signoff-history";

/** The lead's sign-off: the revision in force, whether it is locked, its history, and the next act. */
export function SignoffPanel({ submissionId }: { submissionId: string }) {
  const q = useSignOff(submissionId);
  return (
    <section aria-labelledby="signoff-heading" className="space-y-4 rounded-lg border border-ink-100 bg-white p-5 shadow-sm">
      <div className="flex flex-wrap items-baseline justify-between gap-3">
        <h2 id="signoff-heading" className="text-xl font-semibold">
          Sign-off
        </h2>
        <Link
          href={`/audit?${new URLSearchParams({ entity: "submission", entityId: submissionId })}`}
          className="text-sm font-semibold text-wick-700 underline"
        >
          Audit trail of this submission
        </Link>
      </div>
      {q.isPending && (
        <p role="status" className="text-ink-600">
          Loading the sign-off…
        </p>
      )}
      {q.isError && <Notice tone="error">{q.error.message}</Notice>}
      {q.data && (
        <>
          <p
            data-testid="signoff-state"
            className={`rounded-md px-3 py-2 text-sm font-semibold ${q.data.locked ? "bg-ok-100 text-ok-700" : "bg-ink-50 text-ink-800"}`}
          >
            {q.data.locked
              ? `Locked: signed off as revision ${q.data.revision}. Readings, rulings, runs and samples cannot be changed until a lead re-opens it.`
              : `Revision ${q.data.revision}, not signed off: changes can still be made.`}
          </p>
          <SignoffHistory view={q.data} />
          <div className="border-t border-ink-100 pt-4">
            {q.data.locked ? (
              <ReopenForm submissionId={submissionId} revision={q.data.revision} />
            ) : (
              <SignForm submissionId={submissionId} revision={q.data.revision} />
            )}
          </div>
        </>
      )}
    </section>
  );
}
