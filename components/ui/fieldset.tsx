import type { ComponentProps, ReactNode } from "react";
import { describedBy, FieldMessages } from "./field-messages";

/** A group of radios or checkboxes under one legend, with its error read out for the group. */
export function Fieldset({
  id,
  legend,
  error,
  hint,
  children,
  className = "",
}: {
  id: string;
  legend: string;
  error?: string;
  hint?: string;
  children: ReactNode;
  className?: string;
}) {
  return (
    <fieldset id={id} aria-describedby={describedBy(id, error, hint)} aria-invalid={error ? true : undefined} className={`space-y-1 ${className}`}>
      <legend className="text-sm font-semibold text-ink-800">{legend}</legend>
      <div className="flex flex-wrap gap-x-4 gap-y-2 pt-1">{children}</div>
      <FieldMessages id={id} error={error} hint={hint} />
    </fieldset>
  );
}

/** One radio or checkbox with its label beside it. */
export function Choice({ label, ...input }: { label: string } & ComponentProps<"input">) {
  return (
    <label className="flex items-center gap-1.5 text-sm">
      <input className="h-4 w-4 accent-wick-600" {...input} />
      {label}
    </label>
  );
}
