import type { ComponentProps } from "react";
import { describedBy, FieldMessages } from "./field-messages";

/** A form control's look without its width, for controls that share a row. */
export const CONTROL_BASE = "block rounded-md border border-ink-200 bg-white px-3 py-2 text-ink-900 shadow-sm aria-[invalid=true]:border-bad-700";
export const CONTROL_CLASS = `${CONTROL_BASE} w-full`;

/** A labelled select; the error and hint are read out with it. */
export function SelectField({
  label,
  error,
  hint,
  id,
  children,
  ...select
}: { label: string; error?: string; hint?: string; id: string } & ComponentProps<"select">) {
  return (
    <div className="space-y-1">
      <label htmlFor={id} className="block text-sm font-semibold text-ink-800">
        {label}
      </label>
      <select id={id} aria-invalid={error ? true : undefined} aria-describedby={describedBy(id, error, hint)} className={CONTROL_CLASS} {...select}>
        {children}
      </select>
      <FieldMessages id={id} error={error} hint={hint} />
    </div>
  );
}
