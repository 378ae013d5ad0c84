"use client";

import type { FormEvent } from "react";
import { Button } from "@/components/ui/button";
import { formatDay } from "@/components/ui/dates";
import { DetailList } from "@/components/ui/detail-list";
import { Field } from "@/components/ui/field";
import { LocalTime } from "@/components/ui/local-time";
import { Notice } from "@/components/ui/notice";
import { TextareaField } from "@/components/ui/textarea-field";
import { apiError } from "@/components/ui/form-errors";
import { useAcknowledgeRequest, useSampleRequests, type SampleRequest } from "@/lib/sample-requests/hooks";

// The lab's requests for more samples, as the manufacturer sees them, each acknowledged here with
// how and when the samples are shipped. The lab sees the reply on its own submission page.

const balls = (n: number) => `${n} sample ball${n === 1 ? "" : "s"}`;

export function PortalSampleRequests({ submissionId }: { submissionId: string }) {
  const list = useSampleRequests(submissionId);
  return (
    <section aria-labelledby="portal-requests-heading" className="space-y-3">
      <h2 id="portal-requests-heading" className="text-xl font-semibold">
        Requests for more samples
      </h2>
      {list.isPending && (
        <p className="text-ink-600" role="status">
          Loading the requests…
        </p>
      )}
      {list.isError && <Notice tone="error">{list.error.message}</Notice>}
      {list.data?.length === 0 && <p className="text-ink-600">The laboratory has not asked for more samples of this submission.</p>}
      <ul className="space-y-4">
        {list.data?.map((r) => (
          <RequestItem key={r.id} r={r} submissionId={submissionId} />
        ))}
      </ul>
    </section>
  );
}

function RequestItem({ r, submissionId }: { r: SampleRequest; submissionId: string }) {
  const items = [
    { label: "How many", value: balls(r.count) },
    { label: "Weight", value: r.weight },
    { label: "Needed at the lab by", value: formatDay(r.dueBy) },
    {
      label: "Requested",
      value: (
        <>
          <LocalTime iso={r.requestedAt} /> by {r.requestedByName}
        </>
      ),
    },
  ];
  return (
    <li className="space-y-3 rounded-lg border border-ink-100 bg-white p-5 shadow-sm" aria-labelledby={`request-${r.id}`}>
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h3 id={`request-${r.id}`} className="text-lg font-semibold">
          Round {r.round}: {balls(r.count)}, {r.weight}
        </h3>
        <span className={`rounded-full px-2 py-0.5 text-xs font-semibold ${r.acknowledgedAt ? "bg-ok-100 text-ok-700" : "bg-wick-100 text-wick-700"}`}>
          {r.acknowledgedAt ? "Acknowledged" : "Waiting for your reply"}
        </span>
      </div>
      <DetailList items={items} />
      {r.note && (
        <p className="text-sm text-ink-800">
          <span className="font-semibold">Note from the lab:</span> {r.note}
        </p>
      )}
      {r.acknowledgedAt ? (
        <div className="rounded-md bg-ink-50 p-3 text-sm text-ink-800">
          <p>
            Acknowledged by {r.acknowledgedByName} on <LocalTime iso={r.acknowledgedAt} />
            {r.shippedOn ? `; shipped on ${formatDay(r.shippedOn)}` : "; not shipped yet"}.
          </p>
          <p className="mt-1 whitespace-pre-wrap">
            <span className="font-semibold">Shipping details:</span> {r.shippingDetails}
          </p>
        </div>
      ) : (
        <AcknowledgeForm requestId={r.id} round={r.round} submissionId={submissionId} />
      )}
    </li>
  );
}

function AcknowledgeForm({ requestId, round, submissionId }: { requestId: string; round: number; submissionId: string }) {
  const ack = useAcknowledgeRequest(submissionId);
  const err = apiError(ack.error);
  function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const d = new FormData(e.currentTarget);
    const t = (k: string) => String(d.get(k) ?? "").trim();
    ack.mutate({ id: requestId, shippingDetails: t("shippingDetails"), shippedOn: t("shippedOn") || null });
  }
  // Uncontrolled fields: a refused reply keeps everything typed, with the reason beside it.
  return (
    <form
      onSubmit={onSubmit}
      noValidate
      className="grid gap-4 border-t border-ink-100 pt-4 md:grid-cols-2"
      aria-label={`Acknowledge the request for round ${round}`}
    >
      <TextareaField
        id={`ship-${requestId}`}
        name="shippingDetails"
        label="Shipping details"
        rows={3}
        maxLength={2000}
        required
        hint="Carrier, tracking number, number of parcels: whatever helps the lab receive the samples."
        error={err?.fields?.shippingDetails}
      />
      <Field
        id={`shipped-${requestId}`}
        name="shippedOn"
        type="date"
        label="Shipped on"
        hint="Leave empty if they have not left yet."
        error={err?.fields?.shippedOn}
      />
      <div className="space-y-3 md:col-span-2">
        {ack.isError && <Notice tone="error">{err?.message ?? ack.error.message}</Notice>}
        <Button type="submit" disabled={ack.isPending}>
          {ack.isPending ? "Sending…" : "Acknowledge and send the details"}
        </Button>
      </div>
    </form>
  );
}
