import "server-only";
import type { Actor } from "../auth/actor";
import { recordChange } from "../audit/record";
import { db, type Db } from "../db";
import { env } from "../env";
import { AppError } from "../errors";
import { sendMail } from "../smtp";
import { findOrganisation } from "../organisations/queries";
import { inviteMail } from "./invite-mail";
import { insertInvite, revokeOpenInvites } from "./invite-queries";
import { assertCanManageUsers } from "./policy";
import { findUserById, insertUser, listUsers as selectUsers, lockUser, updateUserRow, type UserRow } from "./queries";
import { roleSetProblem, selfChangeProblem } from "./rules";
import type { InviteInput, UserUpdate } from "./schema";
import { newToken } from "./tokens";
import { auditSnapshot, toUserView, type UserView } from "./view";

export async function listUsers(actor: Actor): Promise<UserView[]> {
  assertCanManageUsers(actor);
  return (await selectUsers(db())).map(toUserView);
}

/**
 * Creates the account and sends the invitation inside one transaction: if the e-mail cannot be
 * sent, nothing is saved and the lead is told why.
 */
export async function inviteUser(actor: Actor, input: InviteInput): Promise<UserView> {
  assertCanManageUsers(actor);
  const organisationId = input.organisationId ?? null;
  const problem = roleSetProblem(input.roles, organisationId);
  if (problem) throw new AppError("validation", problem, { fields: { roles: problem } });
  return db().transaction(async (trx) => {
    if (organisationId && !(await findOrganisation(trx, organisationId))) {
      throw new AppError("validation", "That organisation does not exist.", { fields: { organisationId: "Choose an organisation from the list." } });
    }
    const id = await insertUser(trx, { email: input.email, name: input.name, roles: input.roles, organisationId });
    const user = (await findUserById(trx, id))!;
    await recordChange(trx, actor, { action: "user.invited", entity: "user", entityId: id, after: auditSnapshot(user) });
    await issueInvite(trx, actor, user);
    return toUserView(user);
  });
}

/** A new link for someone who has not set a password yet; older links stop working. */
export async function reinviteUser(actor: Actor, userId: string): Promise<UserView> {
  assertCanManageUsers(actor);
  return db().transaction(async (trx) => {
    await lockUser(trx, userId);
    const user = await findUserById(trx, userId);
    if (!user) throw new AppError("not_found", "No such user.");
    if (user.passwordHash) throw new AppError("conflict", `${user.name} has already set a password; no invitation is needed.`);
    if (!user.active) throw new AppError("conflict", `${user.name} is deactivated; reactivate the account first.`);
    const revoked = await revokeOpenInvites(trx, userId);
    await recordChange(trx, actor, { action: "user.reinvited", entity: "user", entityId: userId, after: { revokedInvites: revoked } });
    await issueInvite(trx, actor, user);
    return toUserView(user);
  });
}

async function issueInvite(trx: Db, actor: Actor, user: UserRow): Promise<void> {
  const { token, hash } = newToken();
  const expiresAt = new Date(Date.now() + env().INVITE_TTL_HOURS * 3600 * 1000);
  await insertInvite(trx, { userId: user.id, tokenHash: hash, createdBy: actor.id, expiresAt });
  const link = `${env().APP_URL.replace(/\/$/, "")}/invite/${token}`;
  try {
    await sendMail(inviteMail({ to: user.email, name: user.name, invitedBy: actor.name, link, expiresAt }));
  } catch (err) {
    throw new AppError("unavailable", "The invitation e-mail could not be sent, so nothing was saved. Check the mail settings and try again.", { cause: err });
  }
}

export async function updateUser(actor: Actor, userId: string, change: UserUpdate): Promise<UserView> {
  assertCanManageUsers(actor);
  const selfProblem = selfChangeProblem(actor.id, userId, change);
  if (selfProblem) throw new AppError("validation", selfProblem);
  return db().transaction(async (trx) => {
    await lockUser(trx, userId);
    const before = await findUserById(trx, userId);
    if (!before) throw new AppError("not_found", "No such user.");
    if (change.roles) {
      const problem = roleSetProblem(change.roles, before.organisationId);
      if (problem) throw new AppError("validation", problem, { fields: { roles: problem } });
    }
    await updateUserRow(trx, userId, change);
    const after = (await findUserById(trx, userId))!;
    const action =
      change.active === false && before.active ? "user.deactivated" : change.active === true && !before.active ? "user.reactivated" : "user.updated";
    await recordChange(trx, actor, { action, entity: "user", entityId: userId, before: auditSnapshot(before), after: auditSnapshot(after) });
    return toUserView(after);
  });
}
