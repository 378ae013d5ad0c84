import type { InputHTMLAttributes } from "react";

/** A labelled input with its error in words, tied together for screen readers. */
export function Field({ label, error, id, ...input }: { label: string; error?: string; id: string } & InputHTMLAttributes<HTMLInputElement>) {
  return (
    <div className="space-y-1">
      <label htmlFor={id} className="block text-sm font-semibold text-ink-800">
        {label}
      </label>
      <input
        id={id}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${id}-error` : undefined}
        className="block w-full rounded-md border border-ink-200 bg-white px-3 py-2 text-ink-900 shadow-sm aria-[invalid=true]:border-bad-700"
        {...input}
      />
      {error && (
        <p id={`${id}-error`} className="text-sm text-bad-700">
          {error}
        </p>
      )}
    </div>
  );
}
