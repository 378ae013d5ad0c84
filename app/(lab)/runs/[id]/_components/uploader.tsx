"use client";

import { Button } from "@/components/ui/button";
import type { Uploads } from "@/lib/uploads/browser/use-uploads";
import { UploadRow } from "./upload-row";

// Only a hint for the file picker: what is accepted is decided by ffprobe on the stored bytes.
const ACCEPT = "video/*,.mp4,.m4v,.mov,.mkv,.webm,.avi,.mts,.m2ts,.ts,.mpg,.mpeg,.vob";

/** Pick recordings, optionally trim them, and send them straight to storage. */
export function Uploader({ uploads }: { uploads: Uploads }) {
  const waiting = uploads.jobs.filter((j) => j.stage === "picked");
  return (
    <div className="space-y-4 rounded-lg border border-ink-100 bg-white p-5 shadow-sm">
      <div>
        <h3 className="text-lg font-semibold">Upload recordings</h3>
        <p className="mt-1 text-sm text-ink-600">
          Files go straight to storage in parts, three at a time. You can pause an upload and resume it later, also after reloading or closing this page.
        </p>
      </div>
      <div className="space-y-1">
        <label htmlFor="clip-files" className="block text-sm font-semibold text-ink-800">
          Video files to upload
        </label>
        <input
          id="clip-files"
          type="file"
          multiple
          accept={ACCEPT}
          aria-describedby="clip-files-hint"
          onChange={(e) => {
            uploads.add(Array.from(e.target.files ?? []));
            e.target.value = ""; // the same file may be picked again later
          }}
          className="block w-full text-sm file:mr-3 file:rounded-md file:border file:border-ink-200 file:bg-ink-50 file:px-3 file:py-2 file:font-semibold"
        />
        <p id="clip-files-hint" className="text-xs text-ink-600">
          Pick one or more files. Each waits for you to upload it whole or trim it first.
        </p>
      </div>
      {waiting.length > 1 && (
        <Button type="button" onClick={() => waiting.forEach((j) => void uploads.start(j.key))}>
          Upload all {waiting.length} files whole
        </Button>
      )}
      {uploads.jobs.length > 0 && (
        <ul aria-label="Uploads" className="space-y-3">
          {uploads.jobs.map((j) => (
            <UploadRow key={j.key} job={j} uploads={uploads} />
          ))}
        </ul>
      )}
    </div>
  );
}
