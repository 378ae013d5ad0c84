import "server-only";
import { randomUUID } from "node:crypto";
import { hashPassword } from "../auth/password";
import { recordChange } from "../audit/record";
import { db, type Db } from "../db";
import { AppError } from "../errors";
import { findInviteByTokenHash, markInviteUsed, type InviteRow } from "./invite-queries";
import { findUserById, updateUserRow } from "./queries";
import { hashToken } from "./tokens";

// Following an invitation link: public use cases, the token is the only credential.

async function usableInvite(q: Db, token: string, lock: boolean): Promise<InviteRow> {
  const invite = token.length <= 100 ? await findInviteByTokenHash(q, hashToken(token), { lock }) : undefined;
  if (!invite) throw new AppError("not_found", "This invitation link is not valid. Check that you copied the whole link, or ask a lead for a new one.");
  if (invite.usedAt) throw new AppError("gone", "This invitation link has already been used. Sign in with your password, or ask a lead for a new link.");
  if (invite.revokedAt) throw new AppError("gone", "This invitation link was replaced by a newer one. Use the latest e-mail, or ask a lead for a new link.");
  if (invite.expiresAt.getTime() <= Date.now()) throw new AppError("gone", "This invitation link has expired. Ask a lead to send you a new one.");
  return invite;
}

export async function describeInvite(token: string): Promise<{ email: string; name: string }> {
  const invite = await usableInvite(db(), token, false);
  const user = await findUserById(db(), invite.userId);
  if (!user?.active) throw new AppError("gone", "This account is no longer active. Ask a lead.");
  return { email: user.email, name: user.name };
}

export async function acceptInvite(token: string, password: string): Promise<{ email: string }> {
  const passwordHash = await hashPassword(password);
  return db().transaction(async (trx) => {
    const invite = await usableInvite(trx, token, true);
    const user = await findUserById(trx, invite.userId);
    if (!user?.active) throw new AppError("gone", "This account is no longer active. Ask a lead.");
    await updateUserRow(trx, user.id, { passwordHash });
    await markInviteUsed(trx, invite.id);
    const self = { id: user.id, email: user.email, name: user.name, roles: user.roles, organisationId: user.organisationId, requestId: randomUUID() };
    await recordChange(trx, self, { action: "user.invite_accepted", entity: "user", entityId: user.id, after: { passwordSet: true } });
    return { email: user.email };
  });
}
