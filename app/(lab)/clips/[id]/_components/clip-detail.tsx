"use client";

import Link from "next/link";
import { Notice } from "@/components/ui/notice";
import { formatBytes } from "@/lib/numbers";
import { inProgress, useClip } from "@/lib/clips/hooks";
import { ClipStatusBadge, clipProblem } from "@/components/clips/clip-status-badge";
import { ClipSteps } from "@/components/clips/clip-steps";
import { ClipFacts } from "./clip-facts";
import { ClipMedia } from "./clip-media";

export function ClipDetail({ id }: { id: string }) {
  const q = useClip(id);
  if (q.isPending)
    return (
      <p className="text-ink-600" role="status">
        Loading the clip…
      </p>
    );
  if (q.isError) return <Notice tone="error">{q.error.message}</Notice>;
  const clip = q.data;
  const problem = clipProblem(clip);

  return (
    <div className="space-y-6">
      <div>
        <Link href={`/runs/${clip.runId}`} className="text-sm font-semibold text-wick-700 underline">
          Back to the run
        </Link>
        <p className="mt-2 text-sm font-semibold uppercase tracking-wide text-wick-700">Clip · {formatBytes(clip.storedSize ?? clip.declaredSize)}</p>
        <h1 className="break-all text-3xl font-bold">{clip.originalName}</h1>
        <p className="mt-2 flex flex-wrap items-center gap-2">
          <ClipStatusBadge status={clip.status} />
          {inProgress(clip.status) && <span className="text-sm text-ink-600">This page follows the work as it happens.</span>}
        </p>
      </div>
      {problem && <Notice tone="error">{problem}</Notice>}
      {clip.duplicateOf && (
        <Notice tone="warn">
          These are the same bytes as a clip uploaded earlier. Both are kept as evidence.{" "}
          <Link href={`/clips/${clip.duplicateOf}`} className="font-semibold underline">
            Open the first upload
          </Link>
        </Notice>
      )}

      <section aria-labelledby="steps-heading" className="space-y-3">
        <h2 id="steps-heading" className="text-xl font-semibold">
          Processing
        </h2>
        <ClipSteps steps={clip.steps} />
      </section>

      <section aria-labelledby="facts-heading" className="space-y-3 rounded-lg border border-ink-100 bg-white p-5 shadow-sm">
        <h2 id="facts-heading" className="text-xl font-semibold">
          What is known about the file
        </h2>
        <ClipFacts clip={clip} />
      </section>

      <ClipMedia clip={clip} />
    </div>
  );
}
