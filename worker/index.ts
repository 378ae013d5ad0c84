import { writeFileSync } from "node:fs";
import { boss, enqueue, QUEUES, stopBoss } from "../lib/jobs";
import { closeDb } from "../lib/db";
import { handlers } from "./handlers";
import { env } from "../lib/env";
import { sweepOutbox } from "../lib/notifications/deliver";
import { digestCron } from "../lib/notifications/digest-rules";

// The background worker: the same lib/ as the app, no Next. Several may run against one database.
async function main() {
  const b = await boss();
  for (const q of Object.values(QUEUES)) {
    const handle = handlers[q.name];
    await b.work(q.name, { batchSize: "batchSize" in q ? q.batchSize : 1, includeMetadata: true, pollingIntervalSeconds: 1 }, async (jobs) => {
      for (const job of jobs) await handle({ data: job.data as Record<string, unknown>, retryCount: job.retryCount, retryLimit: job.retryLimit });
    });
  }
  // The outbox sweep: every due mail gets a delivery job; several workers sweeping is harmless (claims are atomic).
  const sweep = setInterval(() => void sweepOutbox().catch((err) => console.error("worker: outbox sweep failed", err)), env().OUTBOX_SWEEP_SECONDS * 1000);
  // The reviewers' digest: a pg-boss schedule (one job per tick however many workers run), or, when
  // REVIEWER_DIGEST_EVERY_SECONDS is set (tests, demos), a job every N seconds from each worker.
  const every = env().REVIEWER_DIGEST_EVERY_SECONDS;
  const digest = every
    ? setInterval(() => void enqueue("reviewerDigest", {}).catch((err) => console.error("worker: digest job not queued", err)), every * 1000)
    : undefined;
  if (every) await b.unschedule(QUEUES.reviewerDigest.name);
  else await b.schedule(QUEUES.reviewerDigest.name, digestCron(env().REVIEWER_DIGEST_AT), {}, { tz: "UTC" });
  // Lets a test (or an operator) find and signal this very process.
  if (process.env.WORKER_PID_FILE) writeFileSync(process.env.WORKER_PID_FILE, String(process.pid));
  console.log(`worker: consuming ${Object.keys(QUEUES).length} queue(s)`);

  let stopping = false;
  const stop = async (signal: string) => {
    if (stopping) return;
    stopping = true;
    clearInterval(sweep);
    clearInterval(digest);
    console.log(`worker: ${signal}, finishing current jobs`);
    await stopBoss();
    await closeDb();
    process.exit(0);
  };
  process.on("SIGTERM", () => void stop("SIGTERM"));
  process.on("SIGINT", () => void stop("SIGINT"));
}

main().catch((err) => {
  console.error("worker: failed to start", err);
  process.exit(1);
});
