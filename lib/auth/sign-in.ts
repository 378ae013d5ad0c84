import "server-only";
import { randomUUID } from "node:crypto";
import { insertAuditEvent } from "../audit/queries";
import { db } from "../db";
import { AppError } from "../errors";
import { findUserByEmail, type UserRow } from "../users/queries";
import { signInSchema } from "../users/schema";
import { verifyPassword } from "./password";
import { insertSignInAttempt, recentFailures } from "./queries";
import { THROTTLE, throttleDecision, waitInWords } from "./throttle";

const WRONG = "The e-mail or password is not right. Check both and try again.";

/**
 * Checks an e-mail and password for sign-in, throttled per account and per client address.
 * Every outcome is recorded as an attempt and an audit event. Throws AppError with a message in words.
 */
export async function authenticate(raw: unknown, address: string): Promise<UserRow> {
  const parsed = signInSchema.safeParse(raw);
  if (!parsed.success) throw new AppError("validation", "Enter your e-mail and password.");
  const { email, password } = parsed.data;
  const q = db();
  const requestId = randomUUID();
  const now = new Date();

  const [byAccount, byAddress] = await Promise.all([
    recentFailures(q, "email", email, THROTTLE.windowSeconds),
    recentFailures(q, "address", address, THROTTLE.windowSeconds),
  ]);
  const account = throttleDecision(byAccount, THROTTLE.maxFailuresPerAccount, now);
  const place = throttleDecision(byAddress, THROTTLE.maxFailuresPerAddress, now);
  if (!account.allowed || !place.allowed) {
    const wait = Math.max(account.retryAfterSeconds, place.retryAfterSeconds);
    await audit(null, "sign_in.throttled", { email, address }, requestId);
    throw new AppError("too_many_requests", `Too many failed sign-ins. Wait ${waitInWords(wait)} and try again.`);
  }

  const user = await findUserByEmail(q, email);
  const passwordOk = await verifyPassword(password, user?.passwordHash ?? null);
  const reason = !user ? "unknown e-mail" : !passwordOk ? "wrong password" : !user.active ? "deactivated" : null;
  await insertSignInAttempt(q, { email, address, succeeded: reason === null });
  if (reason !== null) {
    await audit(user?.id ?? null, "sign_in.failed", { email, address, reason }, requestId);
    if (reason === "deactivated") throw new AppError("forbidden", "This account has been deactivated. Ask a lead of your lab to reactivate it.");
    throw new AppError("unauthenticated", WRONG);
  }
  await audit(user!.id, "sign_in.succeeded", { email, address }, requestId);
  return user!;
}

async function audit(userId: string | null, action: string, after: Record<string, unknown>, requestId: string) {
  await insertAuditEvent(db(), { actorId: userId, action, entity: "user", entityId: userId, after, requestId });
}
