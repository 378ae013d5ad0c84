import type { OutgoingMail } from "../smtp";

const escapeHtml = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

/** The invitation e-mail: pure, so its wording and link are tested without SMTP. */
export function inviteMail(o: { to: string; name: string; invitedBy: string; link: string; expiresAt: Date }): OutgoingMail {
  const expires = `${o.expiresAt.toISOString().replace("T", " ").slice(0, 16)} UTC`;
  const text = [
    `Hello ${o.name},`,
    "",
    `${o.invitedBy} has invited you to Wickmark, the lab's oil absorption timing system.`,
    "Open this link to choose your password and sign in:",
    "",
    o.link,
    "",
    `The link works once and expires at ${expires}. If you did not expect this, ignore this message.`,
  ].join("\n");
  const html = `<p>Hello ${escapeHtml(o.name)},</p><p>${escapeHtml(o.invitedBy)} has invited you to Wickmark, the lab's oil absorption timing system.</p><p><a href="${escapeHtml(o.link)}">Choose your password</a></p><p>The link works once and expires at ${expires}.</p>`;
  return { to: o.to, subject: "Your Wickmark invitation", text, html };
}
