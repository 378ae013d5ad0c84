// The uploads a page is handling, as plain state: one job per picked file. Pure (a reducer).
import type { Waiting } from "@/lib/uploads/browser/multipart";

export type Stage =
  | "picked" // chosen, not started: the person may trim it first
  | "trimming"
  | "starting"
  | "sending"
  | "pausing" // no new part starts; the parts in flight are finished and stored
  | "paused"
  | "completing"
  | "processing" // stored; the server's jobs take it from here
  | "rejected"; // refused before sending (empty, too large)

export interface UploadJob {
  key: string;
  file: File;
  stage: Stage;
  clipId: string | null;
  sentBytes: number;
  /** Recorded by the server: never lost by a pause or a stop. */
  storedBytes: number;
  /** Parts being sent now (finished by a pause, dropped by "stop now"). */
  partsInFlight: number;
  partsDone: number;
  partCount: number;
  speed: number | null;
  secondsLeft: number | null;
  waiting: Waiting;
  /** Why the upload stopped or could not start, in words. */
  error: string | null;
  rejectReason: string | null;
  /** What was done to the file before sending (trimmed from…), or why it was not. */
  note: string | null;
  /** The browser keeps the file, so the upload can be resumed after a reload (null: not known yet). */
  kept: boolean | null;
}

export type JobAction = { type: "add"; jobs: UploadJob[] } | { type: "patch"; key: string; patch: Partial<UploadJob> } | { type: "remove"; key: string };

let counter = 0;

export function newJob(file: File, over: Partial<UploadJob> = {}): UploadJob {
  return {
    key: `job-${++counter}-${file.name}`,
    file,
    stage: "picked",
    clipId: null,
    sentBytes: 0,
    storedBytes: 0,
    partsInFlight: 0,
    partsDone: 0,
    partCount: 0,
    speed: null,
    secondsLeft: null,
    waiting: null,
    error: null,
    rejectReason: null,
    note: null,
    kept: null,
    ...over,
  };
}

export function jobsReducer(jobs: UploadJob[], a: JobAction): UploadJob[] {
  switch (a.type) {
    case "add":
      // A clip already on the page (resumed twice) is not added again.
      return [...jobs, ...a.jobs.filter((j) => !j.clipId || !jobs.some((o) => o.clipId === j.clipId))];
    case "patch":
      return jobs.map((j) => (j.key === a.key ? { ...j, ...a.patch } : j));
    case "remove":
      return jobs.filter((j) => j.key !== a.key);
  }
}

/** Stages in which the engine is working on the job (Pause makes sense). */
export const isActive = (s: Stage) => s === "starting" || s === "sending" || s === "pausing" || s === "completing";
