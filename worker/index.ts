import { writeFileSync } from "node:fs";
import { boss, QUEUES, stopBoss } from "../lib/jobs";
import { closeDb } from "../lib/db";
import { handlers } from "./handlers";
import { env } from "../lib/env";
import { sweepOutbox } from "../lib/notifications/deliver";

// The background worker: the same lib/ as the app, no Next. Several may run against one database.
async function main() {
  const b = await boss();
  for (const q of Object.values(QUEUES)) {
    const handle = handlers[q.name];
    await b.work(q.name, { batchSize: 1, includeMetadata: true, pollingIntervalSeconds: 1 }, async (jobs) => {
      for (const job of jobs) await handle({ data: job.data as Record<string, unknown>, retryCount: job.retryCount, retryLimit: job.retryLimit });
    });
  }
  // The outbox sweep: every due mail gets a delivery job; several workers sweeping is harmless (claims are atomic).
  const sweep = setInterval(() => void sweepOutbox().catch((err) => console.error("worker: outbox sweep failed", err)), env().OUTBOX_SWEEP_SECONDS * 1000);
  // Lets a test (or an operator) find and signal this very process.
  if (process.env.WORKER_PID_FILE) writeFileSync(process.env.WORKER_PID_FILE, String(process.pid));
  console.log(`worker: consuming ${Object.keys(QUEUES).length} queue(s)`);

  let stopping = false;
  const stop = async (signal: string) => {
    if (stopping) return;
    stopping = true;
    clearInterval(sweep);
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
