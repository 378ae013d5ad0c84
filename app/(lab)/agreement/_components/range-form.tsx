"use client";

import { useState, type FormEvent } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";

/** The period, in whole days (UTC), both ends included. */
export function RangeForm({
  from,
  to,
  errors,
  busy,
  onChange,
}: {
  from: string;
  to: string;
  errors: Record<string, string>;
  busy: boolean;
  onChange: (range: { from: string; to: string }) => void;
}) {
  const [draft, setDraft] = useState({ from, to });
  const [shown, setShown] = useState({ from, to });
  // The server's answer (the default period, say) replaces what the form shows.
  if (shown.from !== from || shown.to !== to) {
    setShown({ from, to });
    setDraft({ from, to });
  }
  const submit = (e: FormEvent) => {
    e.preventDefault();
    onChange(draft);
  };
  return (
    <form onSubmit={submit} className="flex flex-wrap items-end gap-4 rounded-lg border border-ink-100 bg-white p-4 shadow-sm" aria-label="Period">
      <div className="w-44">
        <Field
          id="agreement-from"
          label="From (UTC day)"
          type="date"
          value={draft.from}
          error={errors.from}
          onChange={(e) => setDraft({ ...draft, from: e.target.value })}
        />
      </div>
      <div className="w-44">
        <Field
          id="agreement-to"
          label="To (UTC day, included)"
          type="date"
          value={draft.to}
          error={errors.to}
          onChange={(e) => setDraft({ ...draft, to: e.target.value })}
        />
      </div>
      <Button type="submit" disabled={busy}>
        {busy ? "Computing…" : "Show agreement"}
      </Button>
    </form>
  );
}
