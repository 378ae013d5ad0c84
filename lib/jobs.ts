import "server-only";
import PgBoss from "pg-boss";
import { env } from "./env";

/**
 * Every background queue, declared once. Payloads carry ids only; handlers live in worker/handlers.ts.
 * Transient failures retry with backoff; a job whose worker died is retried once it expires.
 */
const clipStep = <N extends string>(name: N) => ({ name, retryLimit: 3, retryDelay: 5, retryBackoff: true }) as const;

export const QUEUES = {
  ping: { name: "ping", retryLimit: 0, retryDelay: 0, retryBackoff: false },
  clipVerify: clipStep("clip-verify"),
  clipHash: clipStep("clip-hash"),
  clipIndex: clipStep("clip-index"),
  clipProxy: clipStep("clip-proxy"),
  clipThumbnails: clipStep("clip-thumbnails"),
  // Mail comes in bursts (a digest per reviewer): up to 10 rows a poll.
  outboxSend: { name: "outbox-send", retryLimit: 5, retryDelay: 10, retryBackoff: true, batchSize: 10 },
  reviewerDigest: { name: "reviewer-digest", retryLimit: 3, retryDelay: 60, retryBackoff: true },
} as const;

export type QueueKey = keyof typeof QUEUES;

const holder = globalThis as unknown as { __wickmarkBoss?: Promise<PgBoss> };

/** A started pg-boss on the app database (its own `pgboss` schema), with every queue created. */
export function boss(): Promise<PgBoss> {
  holder.__wickmarkBoss ??= (async () => {
    const b = new PgBoss({ connectionString: env().DATABASE_URL, max: 4, maintenanceIntervalSeconds: env().JOB_MAINTENANCE_SECONDS });
    b.on("error", (err) => console.error("pg-boss error", err));
    await b.start();
    for (const q of Object.values(QUEUES)) {
      await b.createQueue(q.name, {
        name: q.name,
        retryLimit: q.retryLimit,
        retryDelay: q.retryDelay,
        retryBackoff: q.retryBackoff,
        expireInSeconds: env().JOB_EXPIRE_SECONDS,
      });
    }
    return b;
  })();
  return holder.__wickmarkBoss;
}

export async function enqueue(queue: QueueKey, payload: Record<string, string | number>): Promise<string | null> {
  return (await boss()).send(QUEUES[queue].name, payload);
}

export async function stopBoss(): Promise<void> {
  const b = await holder.__wickmarkBoss;
  holder.__wickmarkBoss = undefined;
  await b?.stop({ graceful: true });
}
