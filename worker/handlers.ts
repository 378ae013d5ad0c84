import { QUEUE_OF, runClipStep } from "../lib/clips/pipeline";
import { STEPS } from "../lib/clips/rules";
import { QUEUES } from "../lib/jobs";
import { deliverOutboxRow } from "../lib/notifications/deliver";
import { runReviewerDigest } from "../lib/notifications/digest";

export interface JobInfo {
  data: Record<string, unknown>;
  retryCount: number;
  retryLimit: number;
}

type Handler = (job: JobInfo) => Promise<void>;
type QueueName = (typeof QUEUES)[keyof typeof QUEUES]["name"];

const clipHandlers = Object.fromEntries(
  STEPS.map((step) => [QUEUES[QUEUE_OF[step]].name, (job: JobInfo) => runClipStep(step, String(job.data.clipId), job)]),
) as Record<Exclude<QueueName, "ping" | "outbox-send" | "reviewer-digest">, Handler>;

/** One handler per queue in lib/jobs.ts; the type makes a missing one a compile error. */
export const handlers: Record<QueueName, Handler> = {
  // Completes at once: the job's "completed" state is the proof that a worker is consuming.
  async ping() {},
  ...clipHandlers,
  "outbox-send": (job) => deliverOutboxRow(String(job.data.outboxId)),
  // Safe to run twice: one digest per reviewer per day.
  "reviewer-digest": async () => {
    await runReviewerDigest();
  },
};
