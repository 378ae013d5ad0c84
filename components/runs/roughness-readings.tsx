"use client";

import { useFieldArray, useWatch, type Control, type FieldErrors, type UseFormRegister } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { roughnessSummary } from "@/lib/runs/conditions";
import type { RunFormInput, RunFormOutput, RunLimits } from "@/components/runs/run-form-schema";

const MAX_READINGS = 30;

/** Ra readings in µm, added and removed one by one, with their mean and SD as they are typed. */
export function RoughnessReadings({
  control,
  register,
  errors,
  limits,
}: {
  control: Control<RunFormInput, unknown, RunFormOutput>;
  register: UseFormRegister<RunFormInput>;
  errors: FieldErrors<RunFormInput>;
  limits?: RunLimits;
}) {
  const { fields, append, remove } = useFieldArray({ control, name: "roughnessRaUm" });
  const rows = useWatch({ control, name: "roughnessRaUm" }) ?? [];
  const values = rows.map((r) => Number(String(r?.ra ?? "").replace(",", "."))).filter((v, i) => String(rows[i]?.ra ?? "").trim() !== "" && Number.isFinite(v));
  // The same summary the server computes, so what the technician sees here is what gets flagged.
  const summary = roughnessSummary(values);
  const spreadTooWide = limits && summary.sd !== null && summary.sd > limits.roughnessMaxSdUm;

  return (
    <fieldset aria-describedby="roughness-summary" className="space-y-2">
      <legend className="text-sm font-semibold text-ink-800">Roughness readings (Ra, µm)</legend>
      {fields.length === 0 && <p className="text-sm text-ink-600">No readings. Add one for each place measured.</p>}
      <ol className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3">
        {fields.map((f, i) => (
          <li key={f.id} className="flex items-end gap-2">
            <div className="min-w-0 flex-1">
              <Field
                id={`run-ra-${i}`}
                label={`Reading ${i + 1}`}
                inputMode="decimal"
                autoComplete="off"
                error={errors.roughnessRaUm?.[i]?.ra?.message}
                {...register(`roughnessRaUm.${i}.ra`)}
              />
            </div>
            <Button type="button" kind="secondary" onClick={() => remove(i)} aria-label={`Remove reading ${i + 1}`}>
              Remove
            </Button>
          </li>
        ))}
      </ol>
      {errors.roughnessRaUm?.root?.message && <p className="text-sm text-bad-700">{errors.roughnessRaUm.root.message}</p>}
      {errors.roughnessRaUm?.message && <p className="text-sm text-bad-700">{errors.roughnessRaUm.message}</p>}
      <div className="flex flex-wrap items-center gap-4">
        <Button type="button" kind="secondary" onClick={() => append({ ra: "" })} disabled={fields.length >= MAX_READINGS}>
          Add reading
        </Button>
        <p id="roughness-summary" aria-live="polite" className={`text-sm ${spreadTooWide ? "font-semibold text-wick-700" : "text-ink-800"}`}>
          {summary.n === 0
            ? "Mean and SD appear as readings are typed."
            : `${summary.n} reading${summary.n === 1 ? "" : "s"}: mean ${summary.mean!.toFixed(3)} µm, SD ${summary.sd === null ? "needs two readings" : `${summary.sd.toFixed(3)} µm`}.`}
          {spreadTooWide && ` The edition allows an SD of at most ${limits.roughnessMaxSdUm} µm.`}
        </p>
      </div>
    </fieldset>
  );
}
