import "server-only";
import nodemailer, { type Transporter } from "nodemailer";
import { env } from "./env";

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html?: string;
}

const holder = globalThis as unknown as { __wickmarkMail?: Transporter };

function transport(): Transporter {
  holder.__wickmarkMail ??= nodemailer.createTransport(env().SMTP_URL);
  return holder.__wickmarkMail;
}

/** Sends one message over SMTP (the local fake in development and tests). */
export async function sendMail(m: OutgoingMail): Promise<void> {
  await transport().sendMail({ from: env().MAIL_FROM, to: m.to, subject: m.subject, text: m.text, html: m.html });
}
