"use client";

import { Notice } from "@/components/ui/notice";
import { RunForm } from "@/components/runs/run-form";
import { runDefaults } from "@/components/runs/run-form-schema";
import { useUpdateRun, type RunDetail } from "@/lib/runs/hooks";

export function EditRun({ run, onSaved }: { run: RunDetail; onSaved: () => void }) {
  const update = useUpdateRun(run.id);
  return (
    <div className="space-y-4">
      {run.acceptedAt && (
        <Notice tone="warn">
          Saving new conditions withdraws the acceptance by {run.acceptedByName}; a lead must look at the run again if it is still flagged.
        </Notice>
      )}
      <RunForm defaults={runDefaults(run)} submitLabel="Save conditions" save={(body) => update.mutateAsync(body).then(onSaved)} />
    </div>
  );
}
