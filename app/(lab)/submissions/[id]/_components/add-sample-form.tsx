"use client";

import { useState, type FormEvent } from "react";
import { Button } from "@/components/ui/button";
import { instantFromInput, localInput } from "@/components/ui/dates";
import { Field } from "@/components/ui/field";
import { MeasureField } from "@/components/ui/measure-field";
import { Notice } from "@/components/ui/notice";
import { TextareaField } from "@/components/ui/textarea-field";
import { apiError } from "@/components/ui/form-errors";
import { useAddSample } from "@/lib/submissions/hooks";

export const MASS_UNITS = [
  { value: "g", label: "g" },
  { value: "oz", label: "oz" },
  { value: "lb", label: "lb" },
] as const;

export function AddSampleForm({ submissionId, currentRound }: { submissionId: string; currentRound: number }) {
  const add = useAddSample(submissionId);
  const [own, setOwn] = useState<Record<string, string>>({});
  const [added, setAdded] = useState<string | null>(null);
  const err = apiError(add.error);
  const fields: Record<string, string | undefined> = { ...err?.fields, ...own };

  function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = e.currentTarget;
    const data = new FormData(form);
    const text = (k: string) => String(data.get(k) ?? "").trim();
    const receivedAt = instantFromInput(text("receivedAt"));
    const acclimation = instantFromInput(text("acclimationStartedAt"));
    const problems: Record<string, string> = {};
    if (!receivedAt) problems.receivedAt = "Received at is required: give the date and time the ball arrived.";
    if (text("acclimationStartedAt") && !acclimation) problems.acclimationStartedAt = "Acclimation start is not a date and time.";
    setOwn(problems);
    setAdded(null);
    if (Object.keys(problems).length) return;
    const unit = text("unit") as "g" | "oz" | "lb";
    add.mutate(
      {
        serial: text("serial"),
        weight: { value: text("weight"), unit },
        round: text("round") || undefined,
        receivedAt: receivedAt!,
        acclimationStartedAt: acclimation,
        notes: text("notes"),
      },
      {
        onSuccess: (r) => {
          setAdded(`Sample ${r.sample.serial} was added to round ${r.sample.round}.`);
          form.reset();
          (form.elements.namedItem("unit") as HTMLSelectElement).value = unit;
        },
      },
    );
  }

  return (
    <section aria-labelledby="add-sample-heading" className="@container rounded-lg border border-ink-100 bg-white p-5 shadow-sm">
      <h2 id="add-sample-heading" className="text-lg font-semibold">
        Add a sample
      </h2>
      {/* Two columns only when the card itself is wide enough, whatever the window: beside the CSV import it is half as wide. */}
      <form onSubmit={onSubmit} noValidate className="mt-4 grid gap-4 @md:grid-cols-2">
        <Field id="sample-serial" name="serial" label="Serial number" maxLength={60} error={fields.serial} required />
        <MeasureField
          id="sample-weight"
          label="Weight"
          units={MASS_UNITS}
          error={fields["weight.value"] ?? fields["weight.unit"] ?? fields.weight}
          valueProps={{ name: "weight", required: true }}
          unitProps={{ name: "unit", defaultValue: "g" }}
        />
        <Field
          id="sample-received"
          name="receivedAt"
          type="datetime-local"
          label="Received at"
          defaultValue={localInput()}
          error={fields.receivedAt}
          required
        />
        <Field
          id="sample-acclimation"
          name="acclimationStartedAt"
          type="datetime-local"
          label="Acclimation started at"
          hint="When the ball went into the test room; leave blank if not yet."
          error={fields.acclimationStartedAt}
        />
        <Field
          id="sample-round"
          name="round"
          type="number"
          min={1}
          step={1}
          label="Round"
          placeholder={String(currentRound)}
          hint={`Blank means the current round, ${currentRound}.`}
          error={fields.round}
        />
        <div className="@md:col-span-2">
          <TextareaField id="sample-notes" name="notes" label="Notes" rows={2} maxLength={500} error={fields.notes} />
        </div>
        <div className="space-y-3 @md:col-span-2">
          {err && <Notice tone="error">{err.message}</Notice>}
          {added && <Notice tone="ok">{added}</Notice>}
          <Button type="submit" disabled={add.isPending}>
            {add.isPending ? "Adding…" : "Add sample"}
          </Button>
        </div>
      </form>
    </section>
  );
}
