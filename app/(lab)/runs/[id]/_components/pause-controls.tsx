"use client";

import { useId, type ReactNode } from "react";
import { Button } from "@/components/ui/button";
import { formatBytes } from "@/lib/numbers";
import type { UploadJob } from "@/lib/uploads/browser/upload-jobs";
import type { Uploads } from "@/lib/uploads/browser/use-uploads";

const parts = (n: number) => (n === 1 ? "the part in flight" : `the ${n} parts in flight`);

/**
 * Pause, and what it costs, said before it is pressed: Pause finishes the parts in flight and
 * loses nothing; only "Stop now" drops them, and its own words say how much is sent again.
 */
export function PauseControls({ job, uploads, named }: { job: UploadJob; uploads: Uploads; named: ReactNode }) {
  const hintId = useId();
  const inFlightSent = Math.max(0, job.sentBytes - job.storedBytes);
  if (job.stage === "paused")
    return (
      <div className="flex flex-wrap gap-2">
        <Button type="button" onClick={() => uploads.resume(job.key)}>
          Resume{named}
        </Button>
      </div>
    );
  if (job.stage === "pausing") {
    return (
      <div className="space-y-2">
        <p role="status" className="text-sm text-ink-800">
          Pausing: finishing {parts(job.partsInFlight)} ({formatBytes(inFlightSent)} sent so far) so that nothing sent is lost; no new part is started.
        </p>
        <Button type="button" kind="secondary" onClick={() => uploads.stopNow(job.key)} disabled={job.partsInFlight === 0}>
          Stop now: drop {parts(job.partsInFlight)} ({formatBytes(inFlightSent)} sent); Resume sends {job.partsInFlight === 1 ? "it" : "them"} again{named}
        </Button>
      </div>
    );
  }
  return (
    <div className="space-y-1">
      <Button type="button" kind="secondary" onClick={() => uploads.pause(job.key)} disabled={job.stage === "completing"} aria-describedby={hintId}>
        Pause{named}
      </Button>
      <p id={hintId} className="text-xs text-ink-600">
        Pause finishes {job.partsInFlight > 0 ? parts(job.partsInFlight) : "any part in flight"} first and keeps every stored part; no new part is started until
        you resume.
      </p>
    </div>
  );
}
