import "server-only";
import type { Db } from "../db";

export interface InviteRow {
  id: string;
  userId: string;
  expiresAt: Date;
  usedAt: Date | null;
  revokedAt: Date | null;
}

export async function insertInvite(q: Db, i: { userId: string; tokenHash: string; createdBy: string; expiresAt: Date }): Promise<string> {
  const [row] = await q("invites").insert({ user_id: i.userId, token_hash: i.tokenHash, created_by: i.createdBy, expires_at: i.expiresAt }).returning("id");
  return row.id as string;
}

/** Finds by token hash and locks the row, so one link cannot be used twice at once. */
export async function findInviteByTokenHash(q: Db, tokenHash: string, opts: { lock?: boolean } = {}): Promise<InviteRow | undefined> {
  const query = q("invites").where({ token_hash: tokenHash }).first("id", "user_id", "expires_at", "used_at", "revoked_at");
  if (opts.lock) query.forUpdate();
  const r = await query;
  return r ? { id: r.id, userId: r.user_id, expiresAt: r.expires_at, usedAt: r.used_at, revokedAt: r.revoked_at } : undefined;
}

export async function markInviteUsed(q: Db, id: string): Promise<void> {
  await q("invites").where({ id }).update({ used_at: q.fn.now() });
}

export async function revokeOpenInvites(q: Db, userId: string): Promise<number> {
  return q("invites").where({ user_id: userId }).whereNull("used_at").whereNull("revoked_at").update({ revoked_at: q.fn.now() });
}
