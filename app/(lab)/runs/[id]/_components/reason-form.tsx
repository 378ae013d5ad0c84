"use client";

import { useState, type FormEvent, type ReactNode } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { TextareaField } from "@/components/ui/textarea-field";
import { apiError } from "@/components/ui/form-errors";

const MIN_REASON = 10;

interface Props {
  /** The heading and the words above the field. */
  children: ReactNode;
  fieldId: string;
  label: string;
  submit: string;
  pending: string;
  /** Asked before sending, for a decision that cannot be undone. */
  confirm?: string;
  danger?: boolean;
  labelledBy?: string;
  className: string;
  mutation: { mutate: (reason: string) => void; isPending: boolean; error: unknown };
}

/** A lead's decision on a run with a reason said in a sentence (accepting flagged conditions, voiding). */
export function ReasonForm(p: Props) {
  const [reason, setReason] = useState("");
  const [own, setOwn] = useState<string | null>(null);
  const err = apiError(p.mutation.error);

  function onSubmit(e: FormEvent) {
    e.preventDefault();
    const text = reason.trim();
    if (text.length < MIN_REASON) return setOwn(`Write the reason in a sentence (at least ${MIN_REASON} characters).`);
    setOwn(null);
    if (p.confirm && !window.confirm(p.confirm)) return;
    p.mutation.mutate(text);
  }

  return (
    <form onSubmit={onSubmit} noValidate aria-labelledby={p.labelledBy} className={p.className}>
      {p.children}
      <TextareaField
        id={p.fieldId}
        label={p.label}
        value={reason}
        onChange={(e) => setReason(e.target.value)}
        maxLength={1000}
        required
        error={own ?? err?.fields.reason}
      />
      {err && <Notice tone="error">{err.message}</Notice>}
      <Button type="submit" kind={p.danger ? "danger" : undefined} disabled={p.mutation.isPending}>
        {p.mutation.isPending ? p.pending : p.submit}
      </Button>
    </form>
  );
}
