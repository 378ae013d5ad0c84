// How an upload fails: a pause (AbortError), a failure worth another try, or one that is not.

/** A failure with a word on whether trying again can help (a 5xx or a dropped connection can). */
export class PartError extends Error {
  constructor(
    message: string,
    readonly retriable: boolean,
    readonly status = 0,
  ) {
    super(message);
    this.name = "PartError";
  }
}

export const pausedError = () => new DOMException("The upload was paused.", "AbortError");
export const isAbort = (e: unknown) => (e as { name?: string } | null)?.name === "AbortError";

export function isRetriable(e: unknown): boolean {
  if (e instanceof PartError) return e.retriable;
  const status = (e as { status?: unknown } | null)?.status;
  if (typeof status === "number") return status === 0 || status === 408 || status === 429 || status >= 500;
  return e instanceof TypeError; // fetch's "network error"
}

export const defaultBackoff = (attempt: number) => Math.min(30_000, 1000 * 2 ** (attempt - 1)) * (0.75 + Math.random() * 0.5);

export function abortableSleep(ms: number, signal: AbortSignal): Promise<void> {
  return new Promise((resolve, reject) => {
    if (signal.aborted) return reject(pausedError());
    const t = setTimeout(done, ms);
    function done() {
      signal.removeEventListener("abort", onAbort);
      resolve();
    }
    function onAbort() {
      clearTimeout(t);
      reject(pausedError());
    }
    signal.addEventListener("abort", onAbort, { once: true });
  });
}
