"use client";

import { useRouter } from "next/navigation";
import { RunForm } from "@/components/runs/run-form";
import { blankRun, type RunLimits } from "@/components/runs/run-form-schema";
import { useRecordRun } from "@/lib/runs/hooks";

export function NewRunForm({ sampleId, limits }: { sampleId: string; limits: RunLimits }) {
  const router = useRouter();
  const record = useRecordRun(sampleId);
  return (
    <RunForm
      defaults={blankRun()}
      limits={limits}
      submitLabel="Save run"
      save={(body) => record.mutateAsync(body).then((run) => router.push(`/runs/${run.id}`))}
    />
  );
}
