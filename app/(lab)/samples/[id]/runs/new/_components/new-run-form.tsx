"use client";

import { useRouter } from "next/navigation";
import { RunForm } from "@/app/(lab)/_shared/run-form/run-form";
import { blankRun, type RunLimits } from "@/app/(lab)/_shared/run-form/run-form-schema";
import { useRecordRun } from "@/app/_client/runs";

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
