"use client";

import type { FormEvent } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { TextareaField } from "@/components/ui/textarea-field";
import { apiError } from "@/app/_client/form-errors";
import { useAcceptRun } from "@/app/_client/runs";
import { useReason } from "./use-reason";

/** A lead's acceptance of flagged conditions: the reason is kept with the run for the audit. */
export function AcceptForm({ runId }: { runId: string }) {
  const accept = useAcceptRun(runId);
  const { reason, setReason, own, checked } = useReason();
  const err = apiError(accept.error);

  function onSubmit(e: FormEvent) {
    e.preventDefault();
    const text = checked();
    if (text === null) return;
    accept.mutate(text);
  }

  return (
    <form onSubmit={onSubmit} noValidate aria-labelledby="accept-heading" className="space-y-3 rounded-lg border border-wick-300 bg-white p-5 shadow-sm">
      <h3 id="accept-heading" className="text-lg font-semibold">
        Accept anyway
      </h3>
      <p className="text-sm text-ink-600">
        Accepting keeps the run in the results despite the warnings above. Your name, the time and the reason are recorded with it.
      </p>
      <TextareaField
        id="accept-reason"
        label="Reason for accepting"
        value={reason}
        onChange={(e) => setReason(e.target.value)}
        maxLength={1000}
        required
        error={own ?? err?.fields.reason}
      />
      {err && <Notice tone="error">{err.message}</Notice>}
      <Button type="submit" disabled={accept.isPending}>
        {accept.isPending ? "Accepting…" : "Accept anyway"}
      </Button>
    </form>
  );
}
