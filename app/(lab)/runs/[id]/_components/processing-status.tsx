"use client";

import Link from "next/link";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { useClip } from "@/lib/clips/hooks";
import { ClipStatusBadge, clipProblem } from "@/components/clips/clip-status-badge";
import { ClipSteps } from "@/components/clips/clip-steps";

/** After the last part: the server's processing steps, live, until the clip is ready or refused. */
export function ProcessingStatus({ clipId, onDismiss }: { clipId: string; onDismiss: () => void }) {
  const q = useClip(clipId);
  if (q.isPending)
    return (
      <p role="status" className="text-sm">
        Stored. Waiting for processing to start…
      </p>
    );
  if (q.isError) return <Notice tone="error">{q.error.message}</Notice>;
  const clip = q.data;
  const problem = clipProblem(clip);
  const finished = clip.status !== "processing" && clip.status !== "uploading";
  return (
    <div className="space-y-2">
      <p className="flex flex-wrap items-center gap-2 text-sm">
        Stored in full. <ClipStatusBadge status={clip.status} />
        <Link href={`/clips/${clip.id}`} className="font-semibold text-wick-700 underline">
          Open the clip page
        </Link>
      </p>
      <ClipSteps steps={clip.steps} label={`Processing steps of ${clip.originalName}`} />
      {problem && <p className="text-sm text-bad-700">{problem}</p>}
      {finished && (
        <Button type="button" kind="secondary" onClick={onDismiss}>
          Remove from the list<span className="sr-only"> {clip.originalName}</span>
        </Button>
      )}
    </div>
  );
}
