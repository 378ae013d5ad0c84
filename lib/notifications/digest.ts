import "server-only";
import { db } from "../db";
import { env } from "../env";
import { listQueueFor } from "../drops/queries";
import { digestDay, summariseWaiting } from "./digest-rules";
import { listDigestReviewers } from "./digest-queries";
import { queueMail } from "./outbox";
import { reviewerDigestMail } from "./templates";

// The `reviewer-digest` job: once a day (REVIEWER_DIGEST_AT, UTC), one mail per reviewer with drops
// waiting for them. A job of the system, not of a person: it reads each reviewer's own queue (the
// query behind /queue, so the blind rule is the queue's) and writes only counts per submission.

/** Queues the day's digests; returns how many were written. Safe to run again: one per reviewer per day. */
export async function runReviewerDigest(opts: { now?: Date; reviewerIds?: readonly string[] } = {}): Promise<number> {
  const now = opts.now ?? new Date();
  const day = digestDay(now);
  let written = 0;
  for (const r of await listDigestReviewers(db(), day, opts.reviewerIds)) {
    const summary = summariseWaiting(await listQueueFor(db(), r.userId, 10_000));
    if (!summary) continue;
    const mail = reviewerDigestMail({ appUrl: env().APP_URL, name: r.name, day, ...summary });
    written += (await queueMail(db(), [r], mail, `digest:${r.userId}:${day}`)).length;
  }
  return written;
}
