"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { MeasureField } from "@/components/ui/measure-field";
import { Notice } from "@/components/ui/notice";
import { TextareaField } from "@/components/ui/textarea-field";
import type { RunInput } from "@/lib/runs/schema";
import { formatTemperature } from "@/lib/units/rules";
import { apiError, placeServerErrors } from "@/components/ui/form-errors";
import { RoughnessReadings } from "@/components/runs/roughness-readings";
import {
  DISPENSER_UNITS,
  formPath,
  runFormSchema,
  TEMPERATURE_UNITS,
  type RunFormInput,
  type RunFormOutput,
  type RunLimits,
} from "@/components/runs/run-form-schema";

const section = "grid gap-4 rounded-lg border border-ink-100 bg-white p-5 shadow-sm md:grid-cols-2";
const legend = "text-lg font-semibold float-left w-full md:col-span-2";

/** The conditions of one run, for recording a new run or correcting one. */
export function RunForm({
  defaults,
  limits,
  submitLabel,
  save,
}: {
  defaults: RunFormInput;
  limits?: RunLimits;
  submitLabel: string;
  save: (body: RunInput) => Promise<unknown>;
}) {
  const {
    register,
    handleSubmit,
    control,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<RunFormInput, unknown, RunFormOutput>({
    resolver: zodResolver(runFormSchema),
    defaultValues: defaults,
  });
  const [failure, setFailure] = useState<unknown>(null);
  const err = apiError(failure);

  const onSubmit = handleSubmit(async (body) => {
    setFailure(null);
    try {
      await save(body);
    } catch (e) {
      setFailure(e);
      placeServerErrors(e, setError, formPath);
    }
  });

  const surfaceHint = limits
    ? `The edition's window is ${formatTemperature(limits.surfaceTempMinC)} to ${formatTemperature(limits.surfaceTempMaxC)}.`
    : undefined;

  return (
    <form onSubmit={onSubmit} noValidate aria-label="Run conditions" className="space-y-6">
      <fieldset className={section}>
        <legend className={legend}>Test</legend>
        <Field id="run-tested" type="datetime-local" label="Tested at" error={errors.testedAt?.message} {...register("testedAt")} />
        <Field id="run-camera" label="Camera" maxLength={60} error={errors.cameraId?.message} {...register("cameraId")} />
        <MeasureField
          id="run-room"
          label="Room temperature"
          units={TEMPERATURE_UNITS}
          error={errors.roomTemp?.value?.message ?? errors.roomTemp?.unit?.message}
          valueProps={register("roomTemp.value")}
          unitProps={register("roomTemp.unit")}
        />
        <MeasureField
          id="run-surface"
          label="Surface temperature"
          units={TEMPERATURE_UNITS}
          hint={surfaceHint}
          error={errors.surfaceTemp?.value?.message ?? errors.surfaceTemp?.unit?.message}
          valueProps={register("surfaceTemp.value")}
          unitProps={register("surfaceTemp.unit")}
        />
      </fieldset>

      <fieldset className={section}>
        <legend className={legend}>Surface preparation</legend>
        <div className="md:col-span-2">
          <Field id="run-prep-method" label="Preparation method" maxLength={500} error={errors.prepMethod?.message} {...register("prepMethod")} />
        </div>
        <Field id="run-prep-abrasive" label="Abrasive" maxLength={120} error={errors.prepAbrasive?.message} {...register("prepAbrasive")} />
        <Field
          id="run-prep-pad"
          label="Pad cycle position"
          maxLength={120}
          hint="For example, cycle 3 of 10."
          error={errors.prepPadPosition?.message}
          {...register("prepPadPosition")}
        />
        <div className="md:col-span-2">
          <TextareaField id="run-prep-notes" label="Preparation notes" rows={2} maxLength={1000} error={errors.prepNotes?.message} {...register("prepNotes")} />
        </div>
        <div className="md:col-span-2">
          <RoughnessReadings control={control} register={register} errors={errors} limits={limits} />
        </div>
      </fieldset>

      <fieldset className={section}>
        <legend className={legend}>Oil and dispenser</legend>
        <Field id="run-oil-lot" label="Oil lot" maxLength={60} error={errors.oilLot?.message} {...register("oilLot")} />
        <MeasureField
          id="run-dispenser"
          label="Dispenser check"
          units={DISPENSER_UNITS}
          hint="The mass or volume of a test drop; leave blank if not checked for this run."
          error={errors.dispenserCheck?.value?.message ?? errors.dispenserCheck?.unit?.message ?? errors.dispenserCheck?.message}
          valueProps={register("dispenserCheck.value")}
          unitProps={register("dispenserCheck.unit")}
        />
        <div className="md:col-span-2">
          <TextareaField id="run-notes" label="Notes" rows={2} maxLength={2000} error={errors.notes?.message} {...register("notes")} />
        </div>
      </fieldset>

      <div className="space-y-3">
        {err && <Notice tone="error">{err.message}</Notice>}
        <Button type="submit" disabled={isSubmitting}>
          {isSubmitting ? "Saving…" : submitLabel}
        </Button>
      </div>
    </form>
  );
}
