import { db } from "@/lib/db";
import { boss, enqueue, QUEUES, type QueueKey } from "@/lib/jobs";
import { findOutbox, type OutboxRow } from "@/lib/notifications/queries";

// The outbox rows an event wrote, read straight from the database: they are written in the event's
// own transaction, so they are there as soon as the event's request has answered. Mails only prove
// something is absent once the worker is known to have acted; these rows need no waiting.

export interface MailRow {
  id: string;
  kind: string;
  subject: string;
  text: string;
  status: string;
  attempts: number;
}

/** Every outbox row to an address, oldest first; `about` keeps those whose subject or text contains it. */
export async function outboxTo(address: string, about?: string): Promise<MailRow[]> {
  const rows: MailRow[] = await db()("outbox")
    .whereRaw("lower(to_address) = lower(?)", [address])
    .orderBy("created_at")
    .select("id", "kind", "subject", "text", "status", "attempts");
  return about === undefined ? rows : rows.filter((r) => r.subject.includes(about) || r.text.includes(about));
}

export async function waitForOutboxStatus(id: string, status: string, ms = 30_000): Promise<OutboxRow | undefined> {
  const end = Date.now() + ms;
  for (;;) {
    const row = await findOutbox(db(), id);
    if (row?.status === status || Date.now() > end) return row;
    await new Promise((r) => setTimeout(r, 200));
  }
}

/** Waits until the worker has finished the given pg-boss job (completed, or failed for good). */
export async function waitForJob(queue: QueueKey, id: string, ms = 30_000): Promise<string> {
  const b = await boss();
  const end = Date.now() + ms;
  for (;;) {
    const state = (await b.getJobById(QUEUES[queue].name, id))?.state;
    if (state === "completed" || state === "failed" || state === "cancelled") return state;
    if (Date.now() > end) throw new Error(`job ${id} of ${queue} still ${state ?? "unknown"} after ${ms} ms`);
    await new Promise((r) => setTimeout(r, 200));
  }
}

/** Enqueues a job and waits until the worker has finished it: everything queued before it on that queue had its turn. */
export async function enqueueAndWait(queue: QueueKey, payload: Record<string, string | number>, ms = 30_000): Promise<string> {
  const id = await enqueue(queue, payload);
  if (!id) throw new Error(`pg-boss did not take the ${queue} job`);
  return waitForJob(queue, id, ms);
}

/** How many delivery jobs were queued for one outbox row (before a moment, if given); pg-boss keeps finished jobs for hours. */
export async function deliveryJobsFor(outboxId: string, before?: Date): Promise<number> {
  const q = db()("pgboss.job").where({ name: QUEUES.outboxSend.name }).whereRaw("data->>'outboxId' = ?", [outboxId]);
  if (before) q.where("created_on", "<", before);
  const [{ n }] = await q.count<{ n: string }[]>("* as n");
  return Number(n);
}
