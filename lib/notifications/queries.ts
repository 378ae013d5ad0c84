import "server-only";
import type { Db } from "../db";
import type { MailKind } from "./rules";

// The only Knex of notifications: outbox rows, opt-outs and who gets which mail.

export type OutboxStatus = "pending" | "sending" | "sent" | "failed";

export interface OutboxRow {
  id: string;
  kind: MailKind;
  toAddress: string;
  userId: string | null;
  subject: string;
  text: string;
  html: string;
  status: OutboxStatus;
  attempts: number;
  lastError: string | null;
  createdAt: Date;
  sentAt: Date | null;
}

const COLUMNS = [
  "id",
  "kind",
  "to_address as toAddress",
  "user_id as userId",
  "subject",
  "text",
  "html",
  "status",
  "attempts",
  "last_error as lastError",
  "created_at as createdAt",
  "sent_at as sentAt",
];

export async function insertOutbox(
  q: Db,
  rows: { kind: MailKind; toAddress: string; userId: string | null; subject: string; text: string; html: string; dedupeKey: string | null }[],
): Promise<string[]> {
  if (!rows.length) return [];
  const values = rows.map((r) => ({
    kind: r.kind,
    to_address: r.toAddress,
    user_id: r.userId,
    subject: r.subject,
    text: r.text,
    html: r.html,
    dedupe_key: r.dedupeKey,
  }));
  const out = await q("outbox").insert(values).onConflict(q.raw("(dedupe_key) where dedupe_key is not null")).ignore().returning("id");
  return out.map((r: { id: string }) => r.id);
}

/** Takes the row for one delivery attempt, atomically: only one worker at a time gets it. */
export async function claimOutbox(q: Db, id: string, leaseSeconds: number): Promise<OutboxRow | undefined> {
  const [row] = await q("outbox")
    .where({ id })
    .where((w) =>
      w
        .whereIn("status", ["pending", "failed"])
        .orWhere((s) => s.where("status", "sending").where("claimed_at", "<", q.raw("now() - make_interval(secs => ?)", [leaseSeconds]))),
    )
    .update({ status: "sending", claimed_at: q.fn.now(), attempts: q.raw("attempts + 1") })
    .returning(COLUMNS);
  return row;
}

export async function markSent(q: Db, id: string): Promise<void> {
  await q("outbox").where({ id, status: "sending" }).update({ status: "sent", sent_at: q.fn.now(), last_error: null });
}

export async function markFailed(q: Db, id: string, error: string, retryInSeconds: number): Promise<void> {
  await q("outbox")
    .where({ id, status: "sending" })
    .update({ status: "failed", last_error: error.slice(0, 1000), next_attempt_at: q.raw("now() + make_interval(secs => ?)", [retryInSeconds]) });
}

/**
 * Takes the rows due for an attempt (pending or failed whose wait is over, or held in `sending` past
 * the lease) and holds each for one lease before it is due again, so a sweep every few seconds
 * queues one job per row, not one per sweep while the worker catches up.
 */
export async function takeDueOutbox(q: Db, leaseSeconds: number, maxAttempts: number, limit = 100): Promise<string[]> {
  const { rows } = await q.raw(
    `update outbox set next_attempt_at = now() + make_interval(secs => ?)
      where id in (select id from outbox
        where attempts < ? and next_attempt_at <= now()
          and (status in ('pending', 'failed') or (status = 'sending' and claimed_at < now() - make_interval(secs => ?)))
        order by created_at limit ? for update skip locked)
      returning id`,
    [leaseSeconds, maxAttempts, leaseSeconds, limit],
  );
  return rows.map((r: { id: string }) => r.id);
}

export async function findOutbox(q: Db, id: string): Promise<OutboxRow | undefined> {
  return q("outbox").where({ id }).first(COLUMNS);
}

export async function listOutbox(q: Db, f: { status?: OutboxStatus; limit: number }): Promise<OutboxRow[]> {
  const b = q("outbox").orderBy("created_at", "desc").limit(f.limit).select(COLUMNS);
  if (f.status) b.where("status", f.status);
  return b;
}

export interface Recipient {
  userId: string | null;
  email: string;
  optOut: string[];
}

/** Active users holding a role, with their switched-off kinds. */
export async function recipientsWithRole(q: Db, role: string): Promise<Recipient[]> {
  return q("users").where({ active: true }).whereRaw("? = any(roles)", [role]).select("id as userId", "email", "notification_opt_out as optOut");
}

/** An organisation's contact addresses and its active manufacturer users, each address once. */
export async function organisationRecipients(q: Db, organisationId: string): Promise<Recipient[]> {
  const org = await q("organisations").where({ id: organisationId }).first("contact_emails");
  const users: Recipient[] = await q("users")
    .where({ organisation_id: organisationId, active: true })
    .select("id as userId", "email", "notification_opt_out as optOut");
  const seen = new Set(users.map((u) => u.email.toLowerCase()));
  const contacts = ((org?.contact_emails ?? []) as string[]).filter((e) => !seen.has(e.toLowerCase())).map((email) => ({ userId: null, email, optOut: [] }));
  return [...users, ...contacts];
}

export async function findOptOut(q: Db, userId: string): Promise<string[]> {
  const row = await q("users").where({ id: userId }).first("notification_opt_out");
  return row?.notification_opt_out ?? [];
}

export async function updateOptOut(q: Db, userId: string, kinds: string[]): Promise<void> {
  await q("users").where({ id: userId }).update({ notification_opt_out: kinds, updated_at: q.fn.now() });
}
