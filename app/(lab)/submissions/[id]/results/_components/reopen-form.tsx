"use client";

import { useState, type FormEvent } from "react";
import { apiError } from "@/components/ui/form-errors";
import { useReopen } from "@/lib/signoff/hooks";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { TextareaField } from "@/components/ui/textarea-field";

const MIN = 10;

/** Re-opening needs a reason; it starts the next revision, which must be signed again. */
export function ReopenForm({ submissionId, revision }: { submissionId: string; revision: number }) {
  const [reason, setReason] = useState("");
  const [short, setShort] = useState(false);
  const reopen = useReopen(submissionId);
  const err = apiError(reopen.error);
  const submit = (e: FormEvent) => {
    e.preventDefault();
    const tooShort = reason.trim().length < MIN;
    setShort(tooShort);
    if (!tooShort) reopen.mutate({ reason: reason.trim() }, { onSuccess: () => setReason("") });
  };
  const reasonError = short ? `Write the reason for re-opening in a sentence (at least ${MIN} characters).` : err?.fields.reason;
  return (
    <form onSubmit={submit} noValidate aria-label="Re-open" className="space-y-3">
      <h3 className="text-lg font-semibold">Re-open</h3>
      <p className="max-w-3xl text-sm">
        Re-opening unlocks the submission as revision {revision + 1}. The signature of revision {revision} stays on record; the next signature records what
        changed since it.
      </p>
      <TextareaField
        id="reopen-reason"
        label="Reason for re-opening"
        value={reason}
        onChange={(e) => setReason(e.target.value)}
        error={reasonError}
        rows={3}
        maxLength={2000}
      />
      {err && !err.fields.reason && <Notice tone="error">{err.message}</Notice>}
      <Button type="submit" kind="secondary" disabled={reopen.isPending}>
        {reopen.isPending ? "Re-opening…" : `Re-open as revision ${revision + 1}`}
      </Button>
    </form>
  );
}
