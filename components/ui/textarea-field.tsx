import type { ComponentProps } from "react";
import { describedBy, FieldMessages } from "./field-messages";
import { CONTROL_CLASS } from "./select-field";

export function TextareaField({ label, error, hint, id, ...area }: { label: string; error?: string; hint?: string; id: string } & ComponentProps<"textarea">) {
  return (
    <div className="space-y-1">
      <label htmlFor={id} className="block text-sm font-semibold text-ink-800">
        {label}
      </label>
      <textarea id={id} rows={3} aria-invalid={error ? true : undefined} aria-describedby={describedBy(id, error, hint)} className={CONTROL_CLASS} {...area} />
      <FieldMessages id={id} error={error} hint={hint} />
    </div>
  );
}
