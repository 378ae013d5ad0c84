"use client";

import { useEffect, useState } from "react";
import { Button } from "@/components/ui/button";
import { formatBytes } from "@/lib/numbers";
import { useUploadState, type ClipView } from "@/lib/clips/hooks";
import { listPending, readable, removePending, sameFile, type PendingUpload } from "@/lib/uploads/browser/pending-store";

type Kept = { entry: PendingUpload; readable: boolean };
type Resume = (clipId: string, file: File, kept: boolean) => void;

/** Uploads of this run that were started and not finished: resume them, from the kept file or a file picked again. */
export function ResumeOffers({ runId, clips, active, onResume }: { runId: string; clips: ClipView[]; active: Set<string>; onResume: Resume }) {
  const [kept, setKept] = useState<Map<string, Kept> | null>(null);
  useEffect(() => {
    let live = true;
    void listPending(runId).then(async (list) => {
      const found = new Map<string, Kept>();
      for (const entry of list) found.set(entry.clipId, { entry, readable: await readable(entry.file) });
      if (live) setKept(found);
    });
    return () => {
      live = false;
    };
  }, [runId]);
  // The browser forgets uploads that the server has finished with (completed here or elsewhere).
  useEffect(() => {
    for (const id of kept?.keys() ?? []) {
      const c = clips.find((x) => x.id === id);
      if (c && c.status !== "uploading") void removePending(id);
    }
  }, [kept, clips]);

  const unfinished = clips.filter((c) => c.status === "uploading" && !active.has(c.id));
  if (!kept || unfinished.length === 0) return null;
  return (
    <div className="space-y-2 rounded-lg border border-wick-300 bg-wick-100 p-4">
      <h3 className="font-semibold">Unfinished uploads</h3>
      <p className="text-sm">The parts already stored are kept; resuming sends only the rest.</p>
      <ul className="space-y-3">
        {unfinished.map((c) => (
          <ResumeOffer key={c.id} clip={c} kept={kept.get(c.id)} onResume={onResume} />
        ))}
      </ul>
    </div>
  );
}

function ResumeOffer({ clip, kept, onResume }: { clip: ClipView; kept: Kept | undefined; onResume: Resume }) {
  const state = useUploadState(clip.id);
  const [error, setError] = useState<string | null>(null);
  const stored = state.data?.parts.reduce((n, p) => n + p.size, 0) ?? 0;
  const want = { name: clip.originalName, size: clip.declaredSize, lastModified: kept?.entry.lastModified };
  const inputId = `repick-${clip.id}`;

  function onPick(file: File | undefined) {
    if (!file) return;
    if (!sameFile(file, want))
      return setError(
        `That is not the same file: ${file.name} (${formatBytes(file.size)}). This upload needs ${clip.originalName}, ${formatBytes(clip.declaredSize)}${kept ? ", last changed when it was first picked" : ""}.`,
      );
    setError(null);
    onResume(clip.id, file, false);
  }

  return (
    <li className="space-y-2 rounded-md bg-white p-3 text-sm shadow-sm">
      <p>
        <span className="break-all font-semibold">{clip.originalName}</span> · {formatBytes(clip.declaredSize)}
        {state.data && ` · ${state.data.parts.length} of ${state.data.partCount} parts stored (${formatBytes(stored)})`}
      </p>
      {kept?.readable ? (
        <Button type="button" onClick={() => onResume(clip.id, kept.entry.file, true)}>
          Resume upload<span className="sr-only"> of {clip.originalName}</span>
        </Button>
      ) : (
        <div className="space-y-1">
          <p>
            {kept ? "The browser can no longer read the file it kept (it may have been moved or changed)." : "This browser does not hold the file."} Pick the
            same file again to resume.
          </p>
          <label htmlFor={inputId} className="block font-semibold">
            Pick {clip.originalName} again
          </label>
          <input id={inputId} type="file" onChange={(e) => onPick(e.target.files?.[0])} className="block text-sm" />
        </div>
      )}
      {error && (
        <p role="alert" className="text-bad-700">
          {error}
        </p>
      )}
    </li>
  );
}
