import type { ComponentProps } from "react";
import { describedBy, FieldMessages } from "./field-messages";

/** A labelled input with its error in words, tied together for screen readers. */
export function Field({ label, error, hint, id, ...input }: { label: string; error?: string; hint?: string; id: string } & ComponentProps<"input">) {
  return (
    <div className="space-y-1">
      <label htmlFor={id} className="block text-sm font-semibold text-ink-800">
        {label}
      </label>
      <input
        id={id}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(id, error, hint)}
        className="block w-full rounded-md border border-ink-200 bg-white px-3 py-2 text-ink-900 shadow-sm aria-[invalid=true]:border-bad-700"
        {...input}
      />
      <FieldMessages id={id} error={error} hint={hint} />
    </div>
  );
}
