"use client";

import { useState } from "react";
import { useRuleDrop } from "@/lib/rulings/hooks";
import { ApiError } from "@/lib/http/client";
import { rulingSchema } from "@/lib/rulings/schema";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { TextareaField } from "@/components/ui/textarea-field";

export type Choice = "first" | "second" | "third";
export interface ThirdMarks {
  dispenseFrame: number | null;
  clearFrame: number | null;
}

const LABELS: Record<Choice, string> = {
  first: "Accept the first reading",
  second: "Accept the second reading",
  third: "Make a third reading (mark it in the player: D and E)",
};

/** What is missing, by field, in the server's own words (the same schema): checked before asking to confirm. */
function missing(input: Record<string, unknown>): Record<string, string> {
  const r = rulingSchema.safeParse(input);
  const out: Record<string, string> = {};
  if (!r.success) for (const i of r.error.issues) out[String(i.path[0] ?? "form")] ??= i.message;
  return out;
}

/**
 * The lead's choice and reason; the third reading's marks come from the player beside it. Nothing
 * is chosen at first: the lead picks, so no ruling is recorded by leaving a default in place.
 */
export function RulingForm({ dropId, choice, onChoice, third }: { dropId: string; choice: Choice | null; onChoice: (c: Choice) => void; third: ThirdMarks }) {
  const [reason, setReason] = useState("");
  const [local, setLocal] = useState<Record<string, string>>({});
  const rule = useRuleDrop(dropId);
  const fields = { ...(rule.error instanceof ApiError ? rule.error.fields : {}), ...local };
  const marksMissing = [fields.dispenseFrame, fields.clearFrame].filter(Boolean).join(" ");
  return (
    <form
      className="space-y-4"
      noValidate
      onSubmit={(e) => {
        e.preventDefault();
        const marks = choice === "third" ? { dispenseFrame: third.dispenseFrame ?? undefined, clearFrame: third.clearFrame ?? undefined } : {};
        const input = { chosen: choice ?? undefined, reason, ...marks };
        const wrong = missing(input);
        setLocal(wrong);
        if (Object.keys(wrong).length > 0 || !choice) return;
        if (window.confirm("Record this ruling? It stands once made, and the two readings stay on record.")) rule.mutate({ chosen: choice, reason, ...marks });
      }}
    >
      <fieldset className="space-y-2" aria-invalid={fields.chosen ? true : undefined} aria-describedby={fields.chosen ? "ruling-chosen-error" : undefined}>
        <legend className="font-semibold">Ruling</legend>
        {(Object.keys(LABELS) as Choice[]).map((c) => (
          <label key={c} className="flex items-center gap-2 text-sm">
            <input type="radio" name="chosen" value={c} checked={choice === c} onChange={() => (onChoice(c), setLocal(({ chosen: _, ...rest }) => rest))} />
            {LABELS[c]}
          </label>
        ))}
        {fields.chosen && (
          <p id="ruling-chosen-error" className="text-sm text-bad-700">
            {fields.chosen}
          </p>
        )}
      </fieldset>
      {choice === "third" && (
        <p className="text-sm" data-testid="third-marks">
          Third reading: dispense {third.dispenseFrame ?? "not marked"}, clear {third.clearFrame ?? "not marked"}.
          {marksMissing && <span className="block text-bad-700">{marksMissing}</span>}
        </p>
      )}
      <TextareaField
        id="ruling-reason"
        label="Reason for the ruling"
        value={reason}
        onChange={(e) => setReason(e.target.value)}
        error={fields.reason}
        rows={3}
      />
      {rule.error && Object.keys(rule.error instanceof ApiError ? rule.error.fields : {}).length === 0 && <Notice tone="error">{rule.error.message}</Notice>}
      <Button type="submit" disabled={rule.isPending}>
        Record the ruling
      </Button>
    </form>
  );
}
