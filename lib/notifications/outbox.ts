import "server-only";
import type { Db } from "../db";
import { insertOutbox, type Recipient } from "./queries";
import { wantsMail } from "./rules";
import type { MailContent } from "./templates";

/**
 * Writes one outbox row per recipient who wants this kind of mail, in the caller's transaction:
 * the mail exists exactly when the event does. The worker delivers it later (lib/notifications/deliver.ts).
 * `dedupeKey` (per recipient) makes a second call for the same event a no-op.
 */
export async function queueMail(trx: Db, recipients: Recipient[], mail: MailContent, dedupeKey?: string): Promise<string[]> {
  const rows = recipients
    .filter((r) => wantsMail(mail.kind, r.optOut))
    .map((r) => ({
      kind: mail.kind,
      toAddress: r.email,
      userId: r.userId,
      subject: mail.subject,
      text: mail.text,
      html: mail.html,
      dedupeKey: dedupeKey ? `${dedupeKey}:${r.email.toLowerCase()}` : null,
    }));
  return insertOutbox(trx, rows);
}
