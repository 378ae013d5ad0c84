"use client";

import { useState, type FormEvent } from "react";
import { Button } from "@/components/ui/button";
import { formatDay } from "@/components/ui/dates";
import { Field } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { TextareaField } from "@/components/ui/textarea-field";
import { apiError } from "@/components/ui/form-errors";
import { useNextRound, useRequestSamples, useSampleRequests } from "@/lib/sample-requests/hooks";

const inTwoWeeks = () => new Date(Date.now() + 14 * 86_400_000).toISOString().slice(0, 10);

/** Requests for more samples, with the manufacturer's acknowledgement and shipping details; the form asks for the next round. */
export function SampleRequestsPanel({
  submissionId,
  currentRound,
  weights,
  canEdit,
  waiting,
}: {
  submissionId: string;
  currentRound: number;
  weights: number[];
  canEdit: boolean;
  waiting: boolean;
}) {
  const list = useSampleRequests(submissionId);
  const next = useNextRound(submissionId);
  const ask = useRequestSamples(submissionId);
  const [done, setDone] = useState<string | null>(null);
  const err = apiError(ask.error);
  const round = currentRound + 1;

  function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const d = new FormData(e.currentTarget);
    const t = (k: string) => String(d.get(k) ?? "").trim();
    setDone(null);
    ask.mutate(
      { count: t("count") as unknown as number, weight: t("weight"), dueBy: t("dueBy"), note: t("note") },
      { onSuccess: (r) => setDone(`Round ${r.request.round} requested; the manufacturer is told by e-mail.`) },
    );
  }

  return (
    <section aria-labelledby="requests-heading" className="space-y-4">
      <h2 id="requests-heading" className="text-xl font-semibold">
        Requests for more samples
      </h2>
      {list.isError && <Notice tone="error">{list.error.message}</Notice>}
      {list.data?.length === 0 && <p className="text-ink-600">No more samples have been requested.</p>}
      <ul className="space-y-2">
        {list.data?.map((r) => (
          <li key={r.id} className="rounded-lg border border-ink-100 bg-white p-4 text-sm shadow-sm">
            <p className="font-semibold">
              Round {r.round}: {r.count} samples, {r.weight}, due by {formatDay(r.dueBy)}
            </p>
            <p className="text-ink-600">
              Requested by {r.requestedByName}.{r.note ? ` Note: ${r.note}` : ""}
            </p>
            {r.acknowledgedAt ? (
              <p>
                Acknowledged by {r.acknowledgedByName}
                {r.shippedOn ? `, shipped on ${formatDay(r.shippedOn)}` : ""}. Shipping: {r.shippingDetails}
              </p>
            ) : (
              <p className="font-semibold text-ink-800">Not acknowledged by the manufacturer yet.</p>
            )}
          </li>
        ))}
      </ul>
      {canEdit && waiting && <p className="text-ink-600">Round {currentRound} is waiting for its samples; the next round can be requested once they are in.</p>}
      {canEdit && !waiting && next.isSuccess && (
        <form onSubmit={onSubmit} noValidate className="grid gap-4 rounded-lg border border-ink-100 bg-white p-5 shadow-sm md:grid-cols-2">
          <h3 className="text-lg font-semibold md:col-span-2">Request round {round}</h3>
          {next.data && (
            <p className="text-sm text-ink-600 md:col-span-2">
              The staged decision asks for round {next.data.round} with {next.data.size} samples.
            </p>
          )}
          <Field
            id="req-count"
            name="count"
            type="number"
            min={1}
            step={1}
            label="Number of samples"
            defaultValue={next.data?.size ?? ""}
            error={err?.fields?.count}
            required
          />
          <Field
            id="req-weight"
            name="weight"
            label="Weight"
            defaultValue={weights.length ? `${weights.at(-1)} lb` : ""}
            hint="A weight class, or a weight with its unit."
            error={err?.fields?.weight}
            required
          />
          <Field id="req-due" name="dueBy" type="date" label="Due by" defaultValue={inTwoWeeks()} error={err?.fields?.dueBy} required />
          <TextareaField id="req-note" name="note" label="Note to the manufacturer" rows={2} maxLength={2000} error={err?.fields?.note} />
          <div className="space-y-3 md:col-span-2">
            {err && <Notice tone="error">{err.message}</Notice>}
            {done && <Notice tone="ok">{done}</Notice>}
            <Button type="submit" disabled={ask.isPending}>
              {ask.isPending ? "Requesting…" : `Request round ${round}`}
            </Button>
          </div>
        </form>
      )}
    </section>
  );
}
