"use client";

import { Notice } from "@/components/ui/notice";
import { useEdition } from "@/lib/editions/hooks";
import { EditionForm } from "./edition-form";

/** The form waits for the edition it starts from, so every value and note is prefilled at once. */
export function EditionFormLoader({ mode, id }: { mode: "new" | "edit"; id: string | null }) {
  const q = useEdition(id);
  if (!id) return <EditionForm mode="new" />;
  if (q.isPending)
    return (
      <p className="text-ink-600" role="status">
        Loading the edition…
      </p>
    );
  if (q.isError) return <Notice tone="error">{q.error.message}</Notice>;
  if (mode === "edit" && q.data.usedBy.length > 0) {
    return (
      <Notice tone="error">This edition is used by {q.data.usedBy.length} submission(s) and cannot be changed. Make a new edition from it instead.</Notice>
    );
  }
  return (
    <div className="space-y-4">
      {mode === "new" && (
        <Notice tone="info">Starting from {q.data.name}. Change what differs, give it a new name and effective date, and update the source notes.</Notice>
      )}
      <EditionForm mode={mode} from={q.data} />
    </div>
  );
}
