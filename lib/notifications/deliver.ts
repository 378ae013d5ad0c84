import "server-only";
import nodemailer from "nodemailer";
import { db, type Db } from "../db";
import { env } from "../env";
import { enqueue } from "../jobs";
import { claimOutbox, takeDueOutbox, markFailed, markSent, type OutboxRow } from "./queries";
import { MAX_ATTEMPTS, messageIdOf, retryDelaySeconds } from "./rules";

// Delivery of outbox rows. At least once, never twice on purpose: a row is claimed atomically
// (pending/failed → sending), sent with a Message-ID fixed by its id, then marked sent. An SMTP
// error marks it failed with the error and throws, so pg-boss retries; the sweep re-enqueues any
// row that is due, including one held in `sending` past the lease by a worker that died.

/** Sends one claimed row over SMTP (`smtpUrl` defaults to SMTP_URL). */
export async function sendClaimed(row: OutboxRow, smtpUrl = env().SMTP_URL): Promise<void> {
  const t = nodemailer.createTransport(smtpUrl);
  try {
    await t.sendMail({
      from: env().MAIL_FROM,
      to: row.toAddress,
      subject: row.subject,
      text: row.text,
      html: row.html,
      messageId: messageIdOf(row.id, env().MAIL_FROM),
    });
  } finally {
    t.close();
  }
}

/** One attempt: claim, send, mark. Returns false when the row is not due (sent, or held by another worker). */
export async function attemptDelivery(q: Db, id: string, smtpUrl?: string): Promise<boolean> {
  const row = await claimOutbox(q, id, env().OUTBOX_LEASE_SECONDS);
  if (!row) return false;
  try {
    await sendClaimed(row, smtpUrl);
  } catch (err) {
    await markFailed(q, id, err instanceof Error ? err.message : String(err), retryDelaySeconds(row.attempts, env().OUTBOX_RETRY_BASE_SECONDS));
    throw err;
  }
  await markSent(q, id);
  return true;
}

/** The `outbox-send` job. */
export async function deliverOutboxRow(id: string): Promise<void> {
  await attemptDelivery(db(), id);
}

/** The periodic sweep: a job for every due row, so an outage or a dead worker loses nothing. */
export async function sweepOutbox(): Promise<number> {
  const ids = await takeDueOutbox(db(), env().OUTBOX_LEASE_SECONDS, MAX_ATTEMPTS);
  for (const id of ids) await enqueue("outboxSend", { outboxId: id });
  return ids.length;
}
