"use client";

import { useState, type ChangeEvent, type FormEvent } from "react";
import { Button } from "@/components/ui/button";
import { describedBy, FieldMessages } from "@/components/ui/field-messages";
import { CONTROL_CLASS, SelectField } from "@/components/ui/select-field";
import type { ClipView } from "@/lib/clips/hooks";
import { groupDigits } from "@/lib/clips/words";
import { usePlaceDrop, type DropView } from "@/lib/drops/hooks";
import { apiError } from "@/components/ui/form-errors";

/** Puts one drop on a ready recording at a start frame; the server judges the frame and says why it refuses. */
export function PlaceDropForm({ drop, readyClips }: { drop: DropView; readyClips: ClipView[] }) {
  const place = usePlaceDrop(drop.id);
  const [picked, setPicked] = useState<string | null>(null);
  const [frame, setFrame] = useState(drop.startFrame === null ? "" : String(drop.startFrame));
  // Until someone chooses, the drop's own clip, or the only ready one, is the natural choice.
  const clipId = picked ?? drop.clip?.id ?? (readyClips.length === 1 ? readyClips[0].id : "");
  const clip = readyClips.find((c) => c.id === clipId);
  const err = apiError(place.error);
  const id = `drop-${drop.ordinal}`;

  if (!drop.blind && drop.state !== "unread") return <p className="py-1 text-ink-600">Reading has begun, so the drop stays where it is.</p>;

  function onSubmit(e: FormEvent) {
    e.preventDefault();
    const typed = frame.trim();
    // A blank frame travels as NaN, which JSON sends as null: the server refuses it in its own words.
    place.mutate({ clipId, startFrame: typed === "" ? Number.NaN : Number(typed) });
  }
  // A new edit clears the last answer, so "Saved." or a refusal never describes values no longer shown.
  function edited(set: (v: string) => void) {
    return (e: ChangeEvent<HTMLInputElement | HTMLSelectElement>) => {
      set(e.target.value);
      if (place.isSuccess || place.isError) place.reset();
    };
  }
  const frames = clip?.index ? `This recording has frames 0 to ${groupDigits(clip.index.frameCount - 1)}.` : undefined;
  const frameId = `${id}-frame`;
  const frameError = err?.fields.startFrame;
  const general = err && !err.fields.clipId && !err.fields.startFrame ? err.message : null;

  return (
    <form onSubmit={onSubmit} noValidate aria-label={`Place drop ${drop.ordinal}`} className="space-y-1">
      <div className="grid grid-cols-[minmax(10rem,1fr)_7.5rem_auto] items-start gap-2">
        <SelectField id={`${id}-clip`} label="Recording" value={clipId} error={err?.fields.clipId} onChange={edited(setPicked)}>
          <option value="">Choose…</option>
          {readyClips.map((c) => (
            <option key={c.id} value={c.id}>
              {c.originalName}
            </option>
          ))}
        </SelectField>
        <div className="space-y-1">
          <label htmlFor={frameId} className="block text-sm font-semibold text-ink-800">
            Start frame
          </label>
          <input
            id={frameId}
            type="number"
            inputMode="numeric"
            min={0}
            max={clip?.index ? clip.index.frameCount - 1 : undefined}
            step={1}
            value={frame}
            aria-invalid={frameError ? true : undefined}
            aria-describedby={describedBy(frameId, frameError, frames)}
            className={CONTROL_CLASS}
            onChange={edited(setFrame)}
          />
        </div>
        <Button type="submit" className="mt-6" disabled={place.isPending} aria-label={`Save drop ${drop.ordinal}`}>
          {place.isPending ? "Saving…" : "Save"}
        </Button>
      </div>
      {/* Under the whole row, so a long refusal reads on one or two lines rather than in the narrow column. */}
      <FieldMessages id={frameId} error={frameError} hint={frames} />
      {general && (
        <p role="alert" className="text-sm text-bad-700">
          {general}
        </p>
      )}
      {place.isSuccess && (
        <p role="status" className="text-sm text-ok-700">
          Saved.
        </p>
      )}
    </form>
  );
}
