"use client";

import { useState } from "react";
import { useRuleDrop } from "@/app/_client/rulings";
import { ApiError } from "@/lib/http/client";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { TextareaField } from "@/components/ui/textarea-field";

export type Choice = "first" | "second" | "third";
export interface ThirdMarks { dispenseFrame: number | null; clearFrame: number | null }

const LABELS: Record<Choice, string> = { first: "Accept the first reading", second: "Accept the second reading", third: "Make a third reading (mark it in the player: D and E)" };

/** The lead's choice and reason; the third reading's marks come from the player beside it. */
export function RulingForm({ dropId, choice, onChoice, third }: { dropId: string; choice: Choice; onChoice: (c: Choice) => void; third: ThirdMarks }) {
  const [reason, setReason] = useState("");
  const rule = useRuleDrop(dropId);
  const fields = rule.error instanceof ApiError ? rule.error.fields : {};
  return (
    <form
      className="space-y-4"
      onSubmit={(e) => {
        e.preventDefault();
        const marks = choice === "third" ? { dispenseFrame: third.dispenseFrame ?? undefined, clearFrame: third.clearFrame ?? undefined } : {};
        if (window.confirm("Record this ruling? It stands once made, and the two readings stay on record.")) rule.mutate({ chosen: choice, reason, ...marks });
      }}
    >
      <fieldset className="space-y-2">
        <legend className="font-semibold">Ruling</legend>
        {(Object.keys(LABELS) as Choice[]).map((c) => (
          <label key={c} className="flex items-center gap-2 text-sm">
            <input type="radio" name="chosen" value={c} checked={choice === c} onChange={() => onChoice(c)} />
            {LABELS[c]}
          </label>
        ))}
      </fieldset>
      {choice === "third" && (
        <p className="text-sm" data-testid="third-marks">
          Third reading: dispense {third.dispenseFrame ?? "not marked"}, clear {third.clearFrame ?? "not marked"}.
        </p>
      )}
      <TextareaField id="ruling-reason" label="Reason for the ruling" value={reason} onChange={(e) => setReason(e.target.value)} error={fields.reason} rows={3} />
      {rule.error && !fields.reason && <Notice tone="error">{rule.error.message}</Notice>}
      <Button type="submit" disabled={rule.isPending}>Record the ruling</Button>
    </form>
  );
}
