"use client";

import { useId, useState } from "react";
import { Button } from "@/components/ui/button";
import { formatBytes } from "@/lib/numbers";
import { canTrimInBrowser, TRIM_MAX_BYTES } from "@/lib/uploads/trim/trim-rules";
import { isActive, type UploadJob } from "@/lib/uploads/browser/upload-jobs";
import type { Uploads } from "@/lib/uploads/browser/use-uploads";
import { PauseControls } from "./pause-controls";
import { ProcessingStatus } from "./processing-status";
import { TrimPanel } from "./trim-panel";
import { UploadProgress } from "./upload-progress";

/** One picked file: its choices before sending, its progress while sending, its processing after. */
export function UploadRow({ job, uploads }: { job: UploadJob; uploads: Uploads }) {
  const nameId = useId();
  const [trimming, setTrimming] = useState(false);
  const f = job.file;
  const sending = isActive(job.stage) || job.stage === "paused";
  const named = <span className="sr-only"> {f.name}</span>;

  return (
    <li>
      <article aria-labelledby={nameId} className="space-y-3 rounded-md border border-ink-100 p-4">
        <h4 id={nameId} className="break-all font-semibold">
          {f.name} <span className="font-normal text-ink-600">· {formatBytes(f.size)}</span>
        </h4>
        {job.note && <p className="text-sm text-ink-600">{job.note}</p>}
        {job.error && (
          <p role="alert" className="text-sm text-bad-700">
            {job.error}
          </p>
        )}

        {job.stage === "picked" && !trimming && (
          <div className="space-y-2">
            {!canTrimInBrowser(f.size) && f.size > 0 && (
              <p className="text-sm">
                At {formatBytes(f.size)} this file is too large to trim in the browser, which would have to hold it in memory (the limit is{" "}
                {formatBytes(TRIM_MAX_BYTES)}). It is uploaded whole.
              </p>
            )}
            <div className="flex flex-wrap gap-2">
              <Button type="button" onClick={() => void uploads.start(job.key)}>
                Upload whole file{named}
              </Button>
              {canTrimInBrowser(f.size) && (
                <Button type="button" kind="secondary" onClick={() => setTrimming(true)}>
                  Trim first{named}
                </Button>
              )}
              <Button type="button" kind="secondary" onClick={() => uploads.dismiss(job.key)}>
                Remove from the list{named}
              </Button>
            </div>
          </div>
        )}

        {job.stage === "picked" && trimming && (
          <TrimPanel
            file={f}
            onCancel={() => setTrimming(false)}
            onTrimmed={(out, note, source) => {
              setTrimming(false);
              void uploads.start(job.key, out, note, source);
            }}
          />
        )}

        {job.stage === "starting" && (
          <p role="status" className="text-sm">
            Starting the upload…
          </p>
        )}
        {sending && job.stage !== "starting" && (
          <>
            <UploadProgress job={job} />
            <PauseControls job={job} uploads={uploads} named={named} />
          </>
        )}

        {job.stage === "rejected" && (
          <div className="space-y-2">
            <p role="alert" className="text-sm text-bad-700">
              Refused: {job.rejectReason}
            </p>
            <Button type="button" kind="secondary" onClick={() => uploads.dismiss(job.key)}>
              Remove from the list{named}
            </Button>
          </div>
        )}
        {job.stage === "processing" && job.clipId && <ProcessingStatus clipId={job.clipId} onDismiss={() => uploads.dismiss(job.key)} />}
      </article>
    </li>
  );
}
