// Reads what the local SMTP fake received, through its HTTP API (started by `npm test`).
export interface FakeMail {
  to: string[];
  subject: string;
  text: string;
}

export async function mailsTo(address: string): Promise<FakeMail[]> {
  const api = process.env.MAIL_FAKE_API_URL;
  if (!api) throw new Error("MAIL_FAKE_API_URL is not set: run the tests through `npm test`.");
  const res = await fetch(`${api}/messages?to=${encodeURIComponent(address)}`);
  return ((await res.json()) as { messages: FakeMail[] }).messages;
}

/** Waits briefly for a message: SMTP delivery to the fake is quick but not synchronous with the API. */
export async function waitForMail(address: string, count = 1, timeoutMs = 10_000): Promise<FakeMail[]> {
  const end = Date.now() + timeoutMs;
  for (;;) {
    const mails = await mailsTo(address);
    if (mails.length >= count) return mails;
    if (Date.now() > end) throw new Error(`no mail to ${address} within ${timeoutMs} ms`);
    await new Promise((r) => setTimeout(r, 100));
  }
}

export function inviteLink(mail: FakeMail): string {
  const m = mail.text.match(/https?:\/\/\S+\/invite\/[A-Za-z0-9_-]+/);
  if (!m) throw new Error(`no invite link in: ${mail.text}`);
  return m[0];
}
