"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useForm } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { TextareaField } from "@/components/ui/textarea-field";
import { useSaveEdition, type EditionJson } from "@/lib/editions/hooks";
import { apiError, placeServerErrors } from "@/components/ui/form-errors";
import { EDITION_VALUES } from "./edition-fields";
import { editionDefaults, editionFormPath, editionFormSchema, type EditionFormInput, type EditionFormOutput } from "./edition-form-schema";
import { EditionValueRow } from "./edition-value-row";

/** A new edition (blank, or made from an older one), or the correction of an edition not yet in use. */
export function EditionForm({ mode, from }: { mode: "new" | "edit"; from?: EditionJson }) {
  const router = useRouter();
  const save = useSaveEdition(mode === "edit" ? (from?.id ?? null) : null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<EditionFormInput, unknown, EditionFormOutput>({
    resolver: zodResolver(editionFormSchema),
    defaultValues: editionDefaults(from, mode),
  });
  const err = apiError(save.error);

  const onSubmit = handleSubmit((values) =>
    save.mutate(values, {
      onSuccess: (edition) => router.push(`/editions/${edition.id}`),
      onError: (e) => placeServerErrors(e, setError, editionFormPath),
    }),
  );

  return (
    <form onSubmit={onSubmit} noValidate aria-label={mode === "edit" ? "Correct edition" : "New edition"} className="space-y-6">
      <section className="grid gap-4 rounded-lg border border-ink-100 bg-white p-5 shadow-sm md:grid-cols-2">
        <Field
          id="edition-name"
          label="Name"
          maxLength={120}
          hint="For example, the document's title and revision."
          error={errors.name?.message}
          {...register("name")}
        />
        <Field
          id="edition-effective"
          type="date"
          label="Effective from"
          hint="Submissions received on or after this day are judged against it."
          error={errors.effectiveFrom?.message}
          {...register("effectiveFrom")}
        />
        <div className="md:col-span-2">
          <TextareaField id="edition-notes" label="Notes" maxLength={2000} error={errors.notes?.message} {...register("notes")} />
        </div>
      </section>
      <section aria-labelledby="values-heading" className="rounded-lg border border-ink-100 bg-white px-5 pb-1 pt-4 shadow-sm">
        <h2 id="values-heading" className="text-lg font-semibold">
          Values and their sources
        </h2>
        <p className="pb-3 text-sm text-ink-600">
          Beside each value, name the clause of the governing specification it comes from, or say why the lab chose it.
        </p>
        {EDITION_VALUES.map((m) => (
          <EditionValueRow key={m.key} meta={m} register={register} errors={errors} />
        ))}
      </section>
      <div className="space-y-3">
        {err && <Notice tone="error">{err.message}</Notice>}
        <Button type="submit" disabled={save.isPending}>
          {save.isPending ? "Saving…" : mode === "edit" ? "Save corrections" : "Create edition"}
        </Button>
      </div>
    </form>
  );
}
