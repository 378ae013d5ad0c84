import "server-only";
import { z } from "zod";
import type { Actor } from "../auth/actor";
import { recordChange } from "../audit/record";
import { db } from "../db";
import { AppError } from "../errors";
import { hasRole, type Role } from "../users/rules";
import { findOptOut, listOutbox, updateOptOut, type OutboxStatus } from "./queries";
import { KINDS, OPTIONAL_KINDS, type MailKind } from "./rules";
import type { NotificationSetting } from "./view";

// Each person's notification settings, and the leads' view of the outbox.

export const notificationSettingsSchema = z.object({
  optOut: z.array(z.enum(OPTIONAL_KINDS as [MailKind, ...MailKind[]], { error: "That notice cannot be switched off." })).max(20),
});

export async function getMyNotificationSettings(actor: Actor): Promise<NotificationSetting[]> {
  const optOut = await findOptOut(db(), actor.id);
  return (Object.keys(KINDS) as MailKind[]).map((k) => {
    const { label, essential, why, roles } = KINDS[k];
    return { kind: k, label, essential, why, appliesToYou: roles.some((r) => actor.roles.includes(r as Role)), on: essential || !optOut.includes(k) };
  });
}

/** Switches the caller's own optional notices off (listed) or on (not listed); essential ones stay on. */
export async function updateMyNotificationSettings(actor: Actor, v: z.infer<typeof notificationSettingsSchema>): Promise<NotificationSetting[]> {
  await db().transaction(async (trx) => {
    const before = await findOptOut(trx, actor.id);
    const after = [...new Set(v.optOut)].sort();
    await updateOptOut(trx, actor.id, after);
    await recordChange(trx, actor, {
      action: "user.notifications_changed",
      entity: "user",
      entityId: actor.id,
      before: { optOut: before },
      after: { optOut: after },
    });
  });
  return getMyNotificationSettings(actor);
}

export const mailListQuerySchema = z.object({ status: z.enum(["pending", "sending", "sent", "failed"]).optional() });

/** The newest outbox rows with their delivery status (leads), without the bodies. */
export async function listMail(actor: Actor, f: { status?: OutboxStatus }) {
  if (!hasRole(actor, "lead")) throw new AppError("forbidden", "Only a lead can see the mail the lab sends.");
  const rows = await listOutbox(db(), { status: f.status, limit: 200 });
  return rows.map(({ text: _t, html: _h, ...r }) => r);
}
