"use client";

import { ProgressBar } from "@/components/ui/progress-bar";
import { formatBytes } from "@/lib/numbers";
import { formatDuration, formatSpeed } from "@/lib/uploads/browser/speed";
import type { UploadJob } from "@/lib/uploads/browser/upload-jobs";

/** Bytes sent of the total, speed, time left and stored parts; and what the engine is waiting for. */
export function UploadProgress({ job }: { job: UploadJob }) {
  const total = job.file.size;
  const sent = `${formatBytes(job.sentBytes)} of ${formatBytes(total)}`;
  const parts = job.partCount ? `${job.partsDone} of ${job.partCount} parts stored` : "";
  const paused = job.stage === "paused";
  const w = job.waiting;
  return (
    <div className="space-y-1.5">
      <ProgressBar label={`Upload of ${job.file.name}`} value={job.sentBytes} max={total} valueText={sent} tone={paused ? "paused" : "active"} />
      <p className="text-sm tabular-nums text-ink-800">
        {sent}
        {job.stage === "sending" && !w && (
          <>
            {" "}
            · {formatSpeed(job.speed)} · {formatDuration(job.secondsLeft)} left
          </>
        )}
        {parts && <> · {parts}</>}
      </p>
      <p className="text-sm text-ink-600" aria-live="polite">
        {paused && `Paused. ${job.partsDone} of ${job.partCount} parts are stored on the server; Resume sends the rest.`}
        {job.stage === "completing" && "All parts are sent; storage is joining them into one file…"}
        {w?.kind === "offline" && "The network is down. Waiting for it to come back; the parts already stored are kept."}
        {w?.kind === "retry" && `Part ${w.partNumber} did not go through (${w.error}). Trying again in ${w.seconds} s.`}
        {job.kept === false &&
          !paused &&
          job.stage === "sending" &&
          " This browser cannot keep the file: if the page is closed, pick the same file again to resume."}
      </p>
    </div>
  );
}
