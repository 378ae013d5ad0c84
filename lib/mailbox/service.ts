import "server-only";
import type { Actor } from "../auth/actor";
import { env } from "../env";
import { AppError } from "../errors";
import { canReadOutbox } from "../users/policy";

export interface FakeMessage {
  id: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string;
  receivedAt: string;
}

/** Whether the local SMTP fake is configured: only the local start and test scripts set it. */
export function outboxEnabled(): boolean {
  return Boolean(env().MAIL_FAKE_API_URL);
}

/** Messages the local SMTP fake received, for a person trying the demo (development only). */
export async function listFakeMessages(actor: Actor): Promise<FakeMessage[]> {
  if (!outboxEnabled()) throw new AppError("not_found", "The outbox exists only with the local mail fake.");
  if (!canReadOutbox(actor)) throw new AppError("forbidden", "Only a lead can read the outbox.");
  let res: Response;
  try {
    res = await fetch(`${env().MAIL_FAKE_API_URL}/messages`, { cache: "no-store" });
  } catch (err) {
    throw new AppError("unavailable", "The local mail fake is not answering. Is `npm start` still running?", { cause: err });
  }
  if (!res.ok) throw new AppError("unavailable", `The local mail fake answered ${res.status}.`);
  const body = (await res.json()) as { messages: FakeMessage[] };
  return body.messages;
}
