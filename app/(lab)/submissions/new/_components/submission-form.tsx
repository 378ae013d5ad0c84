"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useForm } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { todayInput } from "@/components/ui/dates";
import { Field } from "@/components/ui/field";
import { Choice, Fieldset } from "@/components/ui/fieldset";
import { Notice } from "@/components/ui/notice";
import { SelectField } from "@/components/ui/select-field";
import { TextareaField } from "@/components/ui/textarea-field";
import { KINDS, submissionInputSchema, type SubmissionInput, type SubmissionValues } from "@/lib/submissions/schema";
import { apiError, firstMessage, placeServerErrors } from "@/components/ui/form-errors";
import { useOrganisationList } from "@/lib/organisations/hooks";
import { KIND_LABELS } from "@/components/submissions/submission-labels";
import { useCreateSubmission } from "@/lib/submissions/hooks";
import { ApprovalSelect } from "./approval-select";

const WEIGHT_CLASSES = Array.from({ length: 11 }, (_, i) => i + 6);

const KIND_HINTS = {
  approval: "A new model, judged against the limit.",
  surveillance: "Balls taken from the market later, compared with the model's approval.",
  research: "Tests for the lab's own purposes; no decision is issued.",
} as const;

export function SubmissionForm() {
  const router = useRouter();
  const create = useCreateSubmission();
  const organisations = useOrganisationList();
  const {
    register,
    handleSubmit,
    watch,
    setError,
    setValue,
    formState: { errors },
  } = useForm<SubmissionInput, unknown, SubmissionValues>({
    resolver: zodResolver(submissionInputSchema),
    defaultValues: {
      organisationId: "",
      modelName: "",
      kind: "approval",
      weightClassesLb: [],
      receivedOn: todayInput(),
      approvalSubmissionId: null,
      notes: "",
    },
  });
  const kind = watch("kind");
  const organisationId = watch("organisationId");
  const err = apiError(create.error);

  const onSubmit = handleSubmit((values) =>
    create.mutate(
      { ...values, approvalSubmissionId: values.kind === "surveillance" ? values.approvalSubmissionId : null },
      { onSuccess: (r) => router.push(`/submissions/${r.submission.id}`), onError: (e) => placeServerErrors(e, setError) },
    ),
  );

  return (
    <form
      onSubmit={onSubmit}
      noValidate
      aria-label="New submission"
      className="grid gap-5 rounded-lg border border-ink-100 bg-white p-5 shadow-sm md:grid-cols-2"
    >
      <SelectField
        id="sub-organisation"
        label="Organisation"
        error={errors.organisationId?.message ?? (organisations.isError ? organisations.error.message : undefined)}
        {...register("organisationId", { onChange: () => setValue("approvalSubmissionId", null) })}
      >
        <option value="">Choose…</option>
        {organisations.data?.map((o) => (
          <option key={o.id} value={o.id}>
            {o.name}
          </option>
        ))}
      </SelectField>
      <Field id="sub-model" label="Model name" maxLength={120} error={errors.modelName?.message} {...register("modelName")} />
      <Fieldset id="sub-kind" legend="Kind" error={errors.kind?.message} hint={KIND_HINTS[kind]} className="md:col-span-2">
        {KINDS.map((k) => (
          <Choice key={k} type="radio" value={k} label={KIND_LABELS[k]} {...register("kind")} />
        ))}
      </Fieldset>
      {kind === "surveillance" && (
        <ApprovalSelect
          organisationId={organisationId}
          error={errors.approvalSubmissionId?.message}
          registration={register("approvalSubmissionId", { setValueAs: (v) => v || null })}
        />
      )}
      <Fieldset
        id="sub-weights"
        legend="Weight classes (lb)"
        error={firstMessage(errors.weightClassesLb)}
        hint="The weights this model is made in."
        className="md:col-span-2"
      >
        {WEIGHT_CLASSES.map((lb) => (
          <Choice key={lb} type="checkbox" value={lb} label={`${lb} lb`} {...register("weightClassesLb")} />
        ))}
      </Fieldset>
      <Field id="sub-received" label="Received on" type="date" error={errors.receivedOn?.message} {...register("receivedOn")} />
      <div className="md:col-span-2">
        <TextareaField id="sub-notes" label="Notes" maxLength={2000} error={errors.notes?.message} {...register("notes")} />
      </div>
      <div className="space-y-3 md:col-span-2">
        {err && <Notice tone="error">{err.message}</Notice>}
        <Button type="submit" disabled={create.isPending}>
          {create.isPending ? "Saving…" : "Create submission"}
        </Button>
      </div>
    </form>
  );
}
