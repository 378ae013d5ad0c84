"use client";

import { useEffect, useId, useRef, useState } from "react";
import { Button } from "@/components/ui/button";
import type { TrimSource } from "@/lib/clips/schema";
import { formatTime, parseTime, rangeProblem, trimmedNote } from "@/lib/uploads/trim/trim-rules";
import { useTrim } from "@/lib/uploads/trim/use-trim";
import { TimeField } from "./time-field";

function useObjectUrl(file: File): string | null {
  const [url, setUrl] = useState<string | null>(null);
  useEffect(() => {
    const u = URL.createObjectURL(file);
    setUrl(u);
    return () => URL.revokeObjectURL(u);
  }, [file]);
  return url;
}

/** A local preview, a start and an end, then a stream-copy trim in the browser before uploading. */
export function TrimPanel({
  file,
  onTrimmed,
  onCancel,
}: {
  file: File;
  onTrimmed: (out: File, note: string, source: TrimSource) => void;
  onCancel: () => void;
}) {
  const id = useId();
  const url = useObjectUrl(file);
  const video = useRef<HTMLVideoElement>(null);
  const heading = useRef<HTMLHeadingElement>(null);
  // The button that opened the panel is gone: keyboard focus moves to the panel.
  useEffect(() => heading.current?.focus(), []);
  const [duration, setDuration] = useState<number | null>(null);
  const [noPreview, setNoPreview] = useState(false);
  const [start, setStart] = useState(formatTime(0));
  const [end, setEnd] = useState("");
  const [problem, setProblem] = useState<string | null>(null);
  const trim = useTrim();
  const now = () => formatTime(video.current?.currentTime ?? 0);

  async function go() {
    const s = parseTime(start);
    const e = parseTime(end);
    const wrong = rangeProblem(s, e, duration);
    setProblem(wrong);
    if (wrong) return;
    const out = await trim.run(file, s!, e!);
    if (out) onTrimmed(out.file, trimmedNote(file.name, s!, e!), out.source);
  }

  return (
    // biome-ignore lint/a11y/useSemanticElements: a labelled part of the upload panel, not a set of form fields
    <div role="group" aria-labelledby={`${id}-h`} className="space-y-3 rounded-md bg-ink-50 p-4">
      <h5 id={`${id}-h`} ref={heading} tabIndex={-1} className="font-semibold">
        Trim first
      </h5>
      {url && (
        // biome-ignore lint/a11y/useMediaCaption: a silent recorder's footage, previewed to choose the cut: there is nothing to caption
        <video
          ref={video}
          src={url}
          controls
          preload="metadata"
          aria-label={`Preview of ${file.name}`}
          onLoadedMetadata={(ev) => {
            const d = ev.currentTarget.duration;
            if (Number.isFinite(d)) {
              setDuration(d);
              setEnd((v) => v || formatTime(d));
            }
          }}
          onError={() => setNoPreview(true)}
          className="max-h-80 w-full rounded bg-ink-900"
        />
      )}
      {noPreview && <p className="text-sm">This browser cannot preview this file. You can still type the start and end.</p>}
      <p className="text-sm text-ink-800">
        The trim copies the recording as it is, without re-encoding: it is quick and loses no quality, but the trimmed clip begins at the keyframe at or before
        the start you set, which can be a little earlier. It ends with the frame shown at the end you set, or a few frames later when those last frames depend
        on a later one.
        {duration !== null && ` The recording lasts ${formatTime(duration)}.`}
      </p>
      <div className="grid gap-4 sm:grid-cols-2">
        <TimeField id={`${id}-start`} label="Start" value={start} onChange={setStart} onUseCurrent={() => setStart(now())} disabled={trim.busy} />
        <TimeField id={`${id}-end`} label="End" value={end} onChange={setEnd} onUseCurrent={() => setEnd(now())} disabled={trim.busy} />
      </div>
      {problem && (
        <p role="alert" className="text-sm text-bad-700">
          {problem}
        </p>
      )}
      {trim.error && (
        <p role="alert" className="text-sm text-bad-700">
          {trim.error}
        </p>
      )}
      <div className="flex flex-wrap gap-2">
        <Button type="button" onClick={() => void go()} disabled={trim.busy}>
          {trim.busy ? "Trimming…" : "Trim and upload"}
        </Button>
        <Button type="button" kind="secondary" onClick={onCancel} disabled={trim.busy}>
          Cancel trimming
        </Button>
      </div>
      {trim.busy && (
        <p role="status" className="text-sm">
          {trim.phase === "loading" ? "Loading the trimming tool (about 32 MB, once per visit)…" : "Trimming in the browser…"}
        </p>
      )}
      {trim.line && (
        <pre role="log" aria-label="Trimming tool output" className="overflow-x-auto whitespace-pre-wrap rounded bg-ink-900 p-2 font-mono text-xs text-ink-50">
          {trim.line}
        </pre>
      )}
    </div>
  );
}
