import type { QUEUES } from "../lib/jobs";

type Handler = (data: Record<string, unknown>) => Promise<void>;

/** One handler per queue in lib/jobs.ts; the type makes a missing one a compile error. */
export const handlers: Record<(typeof QUEUES)[keyof typeof QUEUES]["name"], Handler> = {
  // Completes at once: the job's "completed" state is the proof that a worker is consuming.
  async ping() {},
};
