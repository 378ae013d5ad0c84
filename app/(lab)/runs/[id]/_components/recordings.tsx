"use client";

import { Notice } from "@/components/ui/notice";
import { useRunClips } from "@/lib/clips/hooks";
import { useUploads } from "@/lib/uploads/browser/use-uploads";
import { ClipList } from "./clip-list";
import { ResumeOffers } from "./resume-offers";
import { Uploader } from "./uploader";

/** The run's recordings, and for technicians and leads the uploader. */
export function Recordings({ runId, canUpload }: { runId: string; canUpload: boolean }) {
  const clips = useRunClips(runId);
  const uploads = useUploads(runId);
  const active = new Set(uploads.jobs.flatMap((j) => (j.clipId ? [j.clipId] : [])));

  return (
    <section aria-labelledby="recordings-heading" className="space-y-4">
      <h2 id="recordings-heading" className="text-xl font-semibold">
        Recordings
      </h2>
      {clips.isPending && (
        <p className="text-ink-600" role="status">
          Loading the recordings…
        </p>
      )}
      {clips.isError && <Notice tone="error">{clips.error.message}</Notice>}
      {clips.data && <ClipList clips={clips.data} />}
      {canUpload && clips.data && <ResumeOffers runId={runId} clips={clips.data} active={active} onResume={uploads.adopt} />}
      {canUpload && <Uploader uploads={uploads} />}
    </section>
  );
}
