import type { ApiError } from "@/lib/http/client";

/** Addresses typed one per line, or separated by commas or spaces. */
export function parseContacts(text: string): string[] {
  return text
    .split(/[\s,;]+/)
    .map((s) => s.trim())
    .filter(Boolean);
}

/** The server names a bad address by its position ("contactEmails.1"); people read it by its text. */
export function contactsError(err: ApiError | null, sent: string[]): string | undefined {
  if (!err) return undefined;
  const entries = Object.entries(err.fields).filter(([k]) => k.startsWith("contactEmails"));
  if (entries.length === 0) return undefined;
  return entries
    .map(([k, message]) => {
      const i = Number(k.split(".")[1]);
      return Number.isInteger(i) && sent[i] ? `${sent[i]}: ${message}` : message;
    })
    .join(" ");
}
