"use client";

import { useCallback, useEffect, useReducer, useRef } from "react";
import type { TrimSource } from "@/lib/clips/schema";
import { useRefreshRunClips } from "@/lib/clips/hooks";
import { isAbort, sendFile, type Progress } from "@/lib/uploads/browser/multipart";
import { removePending, savePending } from "@/lib/uploads/browser/pending-store";
import { SpeedMeter } from "@/lib/uploads/browser/speed";
import { browserNetwork, browserTransport, startUpload } from "@/lib/uploads/browser/transport";
import { jobsReducer, newJob, type UploadJob } from "@/lib/uploads/browser/upload-jobs";

const REDRAW_MS = 250;
const words = (e: unknown) => (e instanceof Error ? e.message : "The upload stopped for an unknown reason.");

/** The uploads of one run page: start, pause, resume, and progress to draw. */
export function useUploads(runId: string) {
  const [jobs, dispatch] = useReducer(jobsReducer, []);
  const jobsNow = useRef(jobs);
  // Per upload: `stop` drops the parts in flight (leaving, removing, "stop now"); `pause` lets them finish.
  const controllers = useRef(new Map<string, { stop: AbortController; pause: AbortController }>());
  // Keeping a large file in IndexedDB takes a while: sending does not wait for it, finishing does.
  const keeping = useRef(new Map<string, Promise<boolean>>());
  const starting = useRef(new Set<string>());
  const refresh = useRefreshRunClips(runId);
  useEffect(() => {
    jobsNow.current = jobs;
  }, [jobs]);
  // Leaving the page stops the requests; the parts already recorded stay, and the upload can be resumed.
  useEffect(() => () => controllers.current.forEach((c) => c.stop.abort()), []);

  const patch = useCallback((key: string, p: Partial<UploadJob>) => dispatch({ type: "patch", key, patch: p }), []);

  const send = useCallback(
    async (key: string, clipId: string, file: File) => {
      if (controllers.current.has(key)) return;
      const ctl = { stop: new AbortController(), pause: new AbortController() };
      controllers.current.set(key, ctl);
      const meter = new SpeedMeter();
      let drawn = { at: 0, parts: -1, inFlight: -1, phase: "", waiting: "" };
      const seen: { last: Progress | null } = { last: null };
      const onProgress = (p: Progress) => {
        seen.last = p;
        const now = performance.now();
        meter.add(now, p.sentBytes);
        const waiting = JSON.stringify(p.waiting);
        // Progress events come many times a second: redraw a few times a second, and at every part started or stored.
        const same = p.partsDone === drawn.parts && p.partsInFlight === drawn.inFlight && p.phase === drawn.phase && waiting === drawn.waiting;
        if (now - drawn.at < REDRAW_MS && same) return;
        drawn = { at: now, parts: p.partsDone, inFlight: p.partsInFlight, phase: p.phase, waiting };
        patch(key, {
          stage: p.phase === "completing" ? "completing" : ctl.pause.signal.aborted ? "pausing" : "sending",
          sentBytes: p.sentBytes,
          storedBytes: p.storedBytes,
          partsInFlight: p.partsInFlight,
          partsDone: p.partsDone,
          partCount: p.partCount,
          speed: meter.bytesPerSecond(),
          secondsLeft: meter.secondsLeft(p.totalBytes),
          waiting: p.waiting,
        });
      };
      patch(key, { stage: "sending", error: null, waiting: null, speed: null, secondsLeft: null });
      try {
        await sendFile({ clipId, file, transport: browserTransport, network: browserNetwork, signal: ctl.stop.signal, pause: ctl.pause.signal, onProgress });
        await keeping.current.get(clipId);
        await removePending(clipId);
        patch(key, { stage: "processing", sentBytes: file.size, waiting: null });
      } catch (e) {
        // A pause finished the parts in flight, so this is all that was sent; after "stop now" the
        // bar goes back to what the server holds, as the button said it would.
        const stored = seen.last ? { sentBytes: seen.last.storedBytes, storedBytes: seen.last.storedBytes, partsDone: seen.last.partsDone } : {};
        patch(key, { stage: "paused", waiting: null, speed: null, secondsLeft: null, partsInFlight: 0, error: isAbort(e) ? null : words(e), ...stored });
      } finally {
        controllers.current.delete(key);
        refresh();
      }
    },
    [patch, refresh],
  );

  const keep = useCallback(
    (key: string, clipId: string, file: File) => {
      const saving = savePending(runId, clipId, file);
      keeping.current.set(clipId, saving);
      void saving.then((kept) => patch(key, { kept }));
    },
    [patch, runId],
  );

  const add = useCallback((files: File[], over: Partial<UploadJob> = {}) => {
    const made = files.map((f) => newJob(f, over));
    dispatch({ type: "add", jobs: made });
    jobsNow.current = [...jobsNow.current, ...made];
    return made.map((j) => j.key);
  }, []);

  const start = useCallback(
    async (key: string, file?: File, note?: string | null, trim?: TrimSource) => {
      const job = jobsNow.current.find((j) => j.key === key);
      if (!job || job.clipId || starting.current.has(key)) return; // a double click starts one upload
      starting.current.add(key);
      const f = file ?? job.file;
      patch(key, { file: f, stage: "starting", error: null, ...(note !== undefined ? { note } : {}) });
      try {
        const plan = await startUpload(runId, f, trim);
        refresh();
        if (plan.status === "rejected") return patch(key, { stage: "rejected", clipId: plan.clipId, rejectReason: plan.rejectReason });
        patch(key, { clipId: plan.clipId, partCount: plan.partCount });
        keep(key, plan.clipId, f);
        await send(key, plan.clipId, f);
      } catch (e) {
        patch(key, { stage: "picked", error: words(e) });
      } finally {
        starting.current.delete(key);
      }
    },
    [keep, patch, refresh, runId, send],
  );

  /** Starts no new part; the parts in flight are finished and stored, then the upload is paused. */
  const pause = useCallback(
    (key: string) => {
      const c = controllers.current.get(key);
      if (!c || c.pause.signal.aborted) return;
      c.pause.abort();
      patch(key, { stage: "pausing", speed: null, secondsLeft: null });
    },
    [patch],
  );

  /** Pauses at once: the parts in flight are dropped and sent again on Resume. */
  const stopNow = useCallback((key: string) => controllers.current.get(key)?.stop.abort(), []);

  const resume = useCallback(
    (key: string) => {
      const job = jobsNow.current.find((j) => j.key === key);
      if (job?.clipId) void send(key, job.clipId, job.file);
    },
    [send],
  );

  /** Takes up an unfinished upload found after a reload (the file kept by the browser or picked again). */
  const adopt = useCallback(
    (clipId: string, file: File, kept: boolean) => {
      if (jobsNow.current.some((j) => j.clipId === clipId)) return;
      const job = newJob(file, { clipId, stage: "paused", kept });
      dispatch({ type: "add", jobs: [job] });
      jobsNow.current = [...jobsNow.current, job];
      if (!kept) keep(job.key, clipId, file);
      void send(job.key, clipId, file);
    },
    [keep, send],
  );

  const dismiss = useCallback((key: string) => {
    controllers.current.get(key)?.stop.abort();
    dispatch({ type: "remove", key });
  }, []);

  return { jobs, add, start, pause, stopNow, resume, adopt, dismiss };
}

export type Uploads = ReturnType<typeof useUploads>;
