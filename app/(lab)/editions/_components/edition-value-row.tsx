"use client";

import type { FieldErrors, UseFormRegister } from "react-hook-form";
import { Field } from "@/components/ui/field";
import { SelectField } from "@/components/ui/select-field";
import { TextareaField } from "@/components/ui/textarea-field";
import { BELOW_MINIMUM_RULE_LABELS, BELOW_MINIMUM_RULES, CRITERIA, CRITERION_LABELS } from "@/lib/editions/schema";
import { firstMessage } from "@/components/ui/form-errors";
import { labelWithUnit, type EditionFieldMeta } from "./edition-fields";
import type { EditionFormInput } from "./edition-form-schema";

/** One value of an edition beside the note saying where it comes from. */
export function EditionValueRow({
  meta,
  register,
  errors,
}: {
  meta: EditionFieldMeta;
  register: UseFormRegister<EditionFormInput>;
  errors: FieldErrors<EditionFormInput>;
}) {
  const id = `edition-${meta.key}`;
  const error = firstMessage(errors[meta.key]);
  return (
    <div className="grid gap-3 border-t border-ink-100 py-4 md:grid-cols-[minmax(0,2fr)_minmax(0,3fr)]">
      {meta.key === "criterion" ? (
        <SelectField id={id} label={meta.label} hint={meta.hint} error={error} {...register("criterion")}>
          {CRITERIA.map((c) => (
            <option key={c} value={c}>
              {CRITERION_LABELS[c]}
            </option>
          ))}
        </SelectField>
      ) : meta.key === "belowMinimumRule" ? (
        <SelectField id={id} label={meta.label} hint={meta.hint} error={error} {...register("belowMinimumRule")}>
          {BELOW_MINIMUM_RULES.map((r) => (
            <option key={r} value={r}>
              {BELOW_MINIMUM_RULE_LABELS[r]}
            </option>
          ))}
        </SelectField>
      ) : (
        <Field
          id={id}
          label={labelWithUnit(meta)}
          hint={meta.hint}
          error={error}
          inputMode={meta.key === "roundSizes" ? "text" : "decimal"}
          autoComplete="off"
          {...register(meta.key)}
        />
      )}
      <TextareaField
        id={`${id}-source`}
        label={`Source of ${meta.label.charAt(0).toLowerCase()}${meta.label.slice(1)}`}
        rows={2}
        maxLength={500}
        error={firstMessage(errors.sources?.[meta.key])}
        {...register(`sources.${meta.key}`)}
      />
    </div>
  );
}
