"use client";

import type { FormEvent } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { TextareaField } from "@/components/ui/textarea-field";
import { apiError } from "@/app/_client/form-errors";
import { useVoidRun } from "@/app/_client/runs";
import { useReason } from "./use-reason";

/** A lead voids a run that must not count. Final: the run stays on record, shown as voided. */
export function VoidForm({ runId }: { runId: string }) {
  const voiding = useVoidRun(runId);
  const { reason, setReason, own, checked } = useReason();
  const err = apiError(voiding.error);

  function onSubmit(e: FormEvent) {
    e.preventDefault();
    const text = checked();
    if (text === null) return;
    if (!window.confirm("Void this run? It will no longer count, and a void cannot be undone. Record a new run if the ball is to be tested again.")) return;
    voiding.mutate(text);
  }

  return (
    <section aria-labelledby="void-heading" className="rounded-lg border border-ink-100 bg-white p-5 shadow-sm">
      <form onSubmit={onSubmit} noValidate className="space-y-3">
        <h2 id="void-heading" className="text-xl font-semibold">
          Void this run
        </h2>
        <p className="max-w-3xl text-sm text-ink-600">
          For a run that must not count, such as one recorded on the wrong ball. The run and its drops stay on record, marked voided with your name, the time
          and the reason; the ball&apos;s run before it counts again. A void cannot be undone.
        </p>
        <TextareaField
          id="void-reason"
          label="Reason for voiding"
          value={reason}
          onChange={(e) => setReason(e.target.value)}
          maxLength={1000}
          required
          error={own ?? err?.fields.reason}
        />
        {err && <Notice tone="error">{err.message}</Notice>}
        <Button type="submit" kind="danger" disabled={voiding.isPending}>
          {voiding.isPending ? "Voiding…" : "Void this run"}
        </Button>
      </form>
    </section>
  );
}
