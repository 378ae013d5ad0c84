import { db } from "@/lib/db";

// For tests that hold a database lock open to stop a request part-way, then let it go.

export interface Settling<T> {
  promise: Promise<T>;
  done: () => boolean;
}

/** A request in flight, and whether it has answered yet. */
export function settles<T>(promise: Promise<T>): Settling<T> {
  let finished = false;
  promise.then(
    () => (finished = true),
    () => (finished = true),
  );
  return { promise, done: () => finished };
}

/** Sessions waiting on `pid`'s locks, directly or behind one that is. */
async function waitingBehind(pid: number): Promise<number> {
  const r = await db().raw(
    `with direct as (select pid from pg_stat_activity where ? = any(pg_blocking_pids(pid))),
          behind as (select pid from pg_stat_activity where pg_blocking_pids(pid) && array(select pid from direct))
     select (select count(*) from direct) + (select count(*) from behind where pid not in (select pid from direct)) as n`,
    [pid],
  );
  return Number(r.rows[0].n);
}

/**
 * Waits until `count` sessions wait behind the holder's locks, or until the request answers (it
 * was not held up at all: the caller's assertions then say what went through).
 */
export async function blockedBehind(pid: number, count: number, request: Settling<unknown>, timeoutMs = 20_000): Promise<void> {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    if (request.done()) return;
    if ((await waitingBehind(pid)) >= count) return;
    await new Promise((r) => setTimeout(r, 50));
  }
  throw new Error(`Expected ${count} session(s) waiting behind the held lock within ${timeoutMs} ms.`);
}
