/**
 * A failure that trying again cannot fix (the file is not a video, the proxy does not match):
 * the step is marked failed at once. `reject` marks the clip itself rejected as evidence of nothing.
 */
export class PermanentStepError extends Error {
  constructor(
    message: string,
    readonly reject = false,
  ) {
    super(message);
    this.name = "PermanentStepError";
  }
}

export interface StepOutcome {
  state: "done" | "skipped";
  reason?: string;
  detail?: Record<string, unknown>;
}

/** ffprobe/ffmpeg errors that come from the network or the store, not from the file. */
export function isTransientToolError(stderr: string): boolean {
  return /Connection refused|Connection reset|timed out|Server returned 5\d\d|Input\/output error|Temporary failure|Network is unreachable|Broken pipe/i.test(
    stderr,
  );
}
