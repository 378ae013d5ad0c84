"use client";

import { milliseconds } from "@/lib/clips/words";
import { useDiscardDraft, useSubmitReading, type DropView } from "@/lib/drops/hooks";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { CorrectionForm } from "./correction-form";

const s = milliseconds;

/** The viewer's own reading: its marks as the server recorded them, and what can be done next. */
export function MarkPanel({ drop, onJump }: { drop: DropView; onJump: (frame: number) => void }) {
  const submit = useSubmitReading();
  const discard = useDiscardDraft();
  const draft = drop.myDraft;
  const error = submit.error ?? discard.error;

  if (!draft) {
    if (drop.mySubmitted && drop.blind) {
      return (
        <div className="space-y-3">
          <Notice tone="ok">Your reading is submitted: {s(drop.mySubmitted.timeS!)}. The drop is settled once the other reading is in.</Notice>
          <CorrectionForm readingId={drop.mySubmitted.id} />
        </div>
      );
    }
    if (drop.mySubmitted) return <Notice tone="ok">Your reading is submitted: {s(drop.mySubmitted.timeS!)}.</Notice>;
    return (
      <p className="text-sm text-ink-700">
        Step to the first frame with the drop on the surface and mark it, then to the first frame where it can no longer be seen.
      </p>
    );
  }

  const both = draft.dispenseFrame !== null && draft.clearFrame !== null;
  const markLine = (label: string, f: number | null) => (
    <div className="flex items-baseline justify-between gap-2">
      <dt className="text-ink-600">{label}</dt>
      <dd>
        {f === null ? (
          "not marked"
        ) : (
          <button type="button" className="font-mono font-semibold underline" onClick={() => onJump(f)}>
            frame {f}
          </button>
        )}
      </dd>
    </div>
  );
  return (
    <div className="space-y-3" data-testid="mark-panel">
      {draft.supersedesId && <p className="text-sm text-ink-700">Correcting your submitted reading: {draft.correctionReason}</p>}
      <dl className="space-y-1 text-sm">
        {markLine("Dispense", draft.dispenseFrame)}
        {markLine("Clear", draft.clearFrame)}
        <div className="flex items-baseline justify-between gap-2">
          <dt className="text-ink-600">Drop time</dt>
          <dd className="font-mono font-semibold" data-testid="draft-time">
            {both ? `${s(draft.timeS!)} ± ${s(draft.uncertainty!.expanded)}` : "—"}
          </dd>
        </div>
      </dl>
      {both && <p className="text-xs text-ink-600">From the clip&apos;s own frame timestamps; ± is the expanded frame-quantisation uncertainty (k = 2).</p>}
      {error && <Notice tone="error">{error.message}</Notice>}
      <div className="flex flex-wrap gap-2">
        <Button
          disabled={!both || submit.isPending}
          onClick={() => {
            if (window.confirm("Submit this reading? A submitted reading cannot be changed; a later correction keeps it on record.")) submit.mutate(draft.id);
          }}
        >
          Submit reading
        </Button>
        <Button kind="secondary" disabled={discard.isPending} onClick={() => discard.mutate(draft.id)}>
          Discard draft
        </Button>
      </div>
    </div>
  );
}
