import PgBoss from "pg-boss";
import { env } from "./env";

/**
 * Every background queue, declared once. Payloads carry ids only; handlers live in worker/.
 * `ping` lets tests and health checks prove the worker is consuming.
 */
export const QUEUES = {
  ping: { name: "ping", retryLimit: 0 },
} as const;

export type QueueName = keyof typeof QUEUES;

const holder = globalThis as unknown as { __wickmarkBoss?: Promise<PgBoss> };

/** A started pg-boss on the app database (its own `pgboss` schema), with every queue created. */
export function boss(): Promise<PgBoss> {
  holder.__wickmarkBoss ??= (async () => {
    const b = new PgBoss({ connectionString: env().DATABASE_URL, max: 4 });
    b.on("error", (err) => console.error("pg-boss error", err));
    await b.start();
    for (const q of Object.values(QUEUES)) await b.createQueue(q.name, { name: q.name, retryLimit: q.retryLimit });
    return b;
  })();
  return holder.__wickmarkBoss;
}

export async function enqueue(queue: QueueName, payload: Record<string, string | number>): Promise<string | null> {
  return (await boss()).send(QUEUES[queue].name, payload);
}

export async function stopBoss(): Promise<void> {
  const b = await holder.__wickmarkBoss;
  holder.__wickmarkBoss = undefined;
  await b?.stop({ graceful: true });
}
