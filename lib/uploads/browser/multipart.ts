// The upload engine: sends the parts of a file that the server has not recorded yet straight to
// storage, a few at a time, retrying each failed part with backoff, then completes the upload.
// No React and no DOM here (the transport and the clock are passed in), so it can be tested alone.
//
// The server's record is the truth. Every (re)start asks it which parts it holds and queues the
// others. Pausing (`pause`) starts no new part and lets the parts in flight finish and be recorded,
// so nothing sent is lost; stopping (`signal`: leaving the page, removing the upload) aborts the
// parts in flight at once, and the next start sends them again.
import { abortableSleep, defaultBackoff, isRetriable, PartError, pausedError, isAbort } from "@/lib/uploads/browser/errors";
import { SignedUrls } from "@/lib/uploads/browser/signed-urls";

export { isAbort, PartError, pausedError } from "@/lib/uploads/browser/errors";

export interface UploadState {
  status: string;
  size: number;
  partSize: number;
  partCount: number;
  parts: { partNumber: number; size: number }[];
}

export interface Transport {
  state(clipId: string): Promise<UploadState>;
  sign(clipId: string, partNumbers: number[]): Promise<{ partNumber: number; url: string }[]>;
  /** PUTs one part's bytes to a presigned URL and answers the ETag that storage returned. */
  put(url: string, body: Blob, onSent: (bytes: number) => void, signal: AbortSignal): Promise<string>;
  record(clipId: string, partNumber: number, etag: string, size: number): Promise<void>;
  complete(clipId: string): Promise<{ status: string }>;
}

export type Waiting = null | { kind: "offline" } | { kind: "retry"; partNumber: number; seconds: number; error: string };

export interface Progress {
  /** Recorded by the server plus what is in flight now. */
  sentBytes: number;
  /** Recorded by the server: what a pause keeps, and all a stop keeps. */
  storedBytes: number;
  /** Parts being sent now: a pause waits for them, a stop drops them. */
  partsInFlight: number;
  totalBytes: number;
  partsDone: number;
  partCount: number;
  phase: "sending" | "completing";
  waiting: Waiting;
}

export interface Network {
  isOnline(): boolean;
  whenOnline(signal: AbortSignal): Promise<void>;
}

export interface SendOptions {
  clipId: string;
  file: Blob;
  transport: Transport;
  /** Stops at once: the parts in flight are dropped (not recorded, so sent again next time). */
  signal: AbortSignal;
  /** Pauses: no new part is started, the parts in flight are finished and recorded, then it rejects with an AbortError. */
  pause?: AbortSignal;
  onProgress?: (p: Progress) => void;
  concurrency?: number;
  maxAttempts?: number;
  backoffMs?: (attempt: number) => number;
  sleep?: (ms: number, signal: AbortSignal) => Promise<void>;
  network?: Network;
}

const alwaysOnline: Network = { isOnline: () => true, whenOnline: async () => {} };
const message = (e: unknown) => (e instanceof Error ? e.message : String(e));

/** Sends what is missing and completes; resolves with the clip's status after completion. Rejects with an AbortError when paused or stopped. */
export async function sendFile(o: SendOptions): Promise<{ status: string }> {
  for (let round = 1; ; round++) {
    const state = await o.transport.state(o.clipId);
    if (state.status !== "uploading") return { status: state.status };
    if (state.size !== o.file.size)
      throw new PartError(`This file is ${o.file.size} bytes but the upload expects ${state.size}: pick the same file that was started.`, false);
    await sendMissing(o, state);
    report(o, state, { sent: state.size, stored: state.size, inFlight: 0 }, state.partCount, "completing", null);
    try {
      return await withRetries(o, () => o.transport.complete(o.clipId));
    } catch (e) {
      // 409: the server still misses a part (recorded elsewhere meanwhile?): ask it again, once or twice.
      if ((e as { status?: number }).status !== 409 || round >= 3) throw e;
    }
  }
}

function report(
  o: SendOptions,
  s: UploadState,
  bytes: { sent: number; stored: number; inFlight: number },
  partsDone: number,
  phase: Progress["phase"],
  waiting: Waiting,
) {
  o.onProgress?.({
    sentBytes: bytes.sent,
    storedBytes: bytes.stored,
    partsInFlight: bytes.inFlight,
    totalBytes: s.size,
    partsDone,
    partCount: s.partCount,
    phase,
    waiting,
  });
}

async function withRetries<T>(o: SendOptions, act: () => Promise<T>): Promise<T> {
  const sleep = o.sleep ?? abortableSleep;
  for (let attempt = 1; ; attempt++) {
    try {
      return await act();
    } catch (e) {
      if (o.signal.aborted) throw pausedError();
      if (!isRetriable(e) || attempt >= (o.maxAttempts ?? 6)) throw e;
      await sleep((o.backoffMs ?? defaultBackoff)(attempt), o.signal);
    }
  }
}

async function sendMissing(o: SendOptions, s: UploadState): Promise<void> {
  const have = new Set(s.parts.map((p) => p.partNumber));
  const queue = Array.from({ length: s.partCount }, (_, i) => i + 1).filter((n) => !have.has(n));
  const inFlight = new Map<number, number>();
  let doneBytes = s.parts.reduce((n, p) => n + p.size, 0);
  let partsDone = have.size;
  let waiting: Waiting = null;
  const stop = new AbortController();
  // Waiting (a backoff, the network) ends on a pause too: a part that has to wait is not in flight.
  const halt = new AbortController();
  const onAbort = () => (stop.abort(), halt.abort());
  const onPause = () => halt.abort();
  o.signal.addEventListener("abort", onAbort, { once: true });
  o.pause?.addEventListener("abort", onPause, { once: true });
  if (o.pause?.aborted) halt.abort();
  const urls = new SignedUrls((nums) => o.transport.sign(o.clipId, nums));
  const network = o.network ?? alwaysOnline;
  const sleep = o.sleep ?? abortableSleep;
  const sending = new Set<number>();
  const emit = () =>
    report(
      o,
      s,
      { sent: doneBytes + [...inFlight.values()].reduce((a, b) => a + b, 0), stored: doneBytes, inFlight: sending.size },
      partsDone,
      "sending",
      waiting,
    );

  async function sendPart(n: number): Promise<void> {
    const body = o.file.slice((n - 1) * s.partSize, Math.min(n * s.partSize, s.size));
    for (let attempt = 1; ; attempt++) {
      if (halt.signal.aborted) throw pausedError(); // paused while this part waited for another try
      try {
        sending.add(n);
        emit();
        const url = await urls.get(n, queue);
        const etag = await o.transport.put(url, body, (b) => (inFlight.set(n, b), emit()), stop.signal);
        await o.transport.record(o.clipId, n, etag, body.size);
        inFlight.delete(n);
        sending.delete(n);
        doneBytes += body.size;
        partsDone++;
        return emit();
      } catch (e) {
        inFlight.delete(n);
        sending.delete(n);
        if (stop.signal.aborted) throw pausedError();
        if (e instanceof PartError && e.status === 403) urls.forget(n); // an expired signature: sign again
        if (!isRetriable(e)) throw e;
        if (halt.signal.aborted) throw pausedError(); // paused: the next start tries this part again
        if (!network.isOnline()) {
          waiting = { kind: "offline" };
          emit();
          await network.whenOnline(halt.signal);
          waiting = null;
          attempt--; // time spent offline does not use up tries
          continue;
        }
        if (attempt >= (o.maxAttempts ?? 6))
          throw new PartError(`Part ${n} of ${s.partCount} could not be sent after ${attempt} tries (${message(e)}).`, false);
        const ms = (o.backoffMs ?? defaultBackoff)(attempt);
        waiting = { kind: "retry", partNumber: n, seconds: Math.ceil(ms / 1000), error: message(e) };
        emit();
        await sleep(ms, halt.signal);
        waiting = null;
      }
    }
  }

  async function worker(): Promise<void> {
    while (!halt.signal.aborted && !stop.signal.aborted) {
      const n = queue.shift();
      if (n === undefined) return;
      await sendPart(n);
    }
  }

  emit();
  try {
    const lanes = Array.from({ length: Math.min(o.concurrency ?? 3, queue.length) }, () =>
      worker().catch((e) => {
        // One part failed for good: stop the others and report it. A lane that paused leaves the others be.
        if (!isAbort(e)) stop.abort(), halt.abort();
        throw e;
      }),
    );
    const outcomes = await Promise.allSettled(lanes);
    if (o.signal.aborted) throw pausedError();
    const failed = outcomes.find((r): r is PromiseRejectedResult => r.status === "rejected" && !isAbort(r.reason));
    if (failed) throw failed.reason;
    if (partsDone < s.partCount) throw pausedError();
  } finally {
    o.signal.removeEventListener("abort", onAbort);
    o.pause?.removeEventListener("abort", onPause);
  }
}
