"use client";

import { useState } from "react";
import { useStartCorrection } from "@/lib/drops/hooks";
import { ApiError } from "@/lib/http/client";
import { Button } from "@/components/ui/button";
import { TextareaField } from "@/components/ui/textarea-field";

/** A correction starts a new draft from the submitted marks; the submitted reading stays on record. */
export function CorrectionForm({ readingId }: { readingId: string }) {
  const [open, setOpen] = useState(false);
  const [reason, setReason] = useState("");
  const start = useStartCorrection();
  if (!open)
    return (
      <Button kind="secondary" onClick={() => setOpen(true)}>
        Correct my reading…
      </Button>
    );
  const error = start.error instanceof ApiError ? (start.error.fields.reason ?? start.error.message) : start.error?.message;
  return (
    <form
      className="space-y-3"
      onSubmit={(e) => {
        e.preventDefault();
        start.mutate({ readingId, reason }, { onSuccess: () => setOpen(false) });
      }}
    >
      <TextareaField
        id="correction-reason"
        label="Why the reading needs correcting"
        value={reason}
        onChange={(e) => setReason(e.target.value)}
        error={error}
        rows={2}
      />
      <p className="text-sm text-ink-600">Your submitted reading is kept and shown as superseded once the correction is submitted.</p>
      <div className="flex gap-2">
        <Button type="submit" disabled={start.isPending}>
          Start the correction
        </Button>
        <Button type="button" kind="secondary" onClick={() => setOpen(false)}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
