import type { MailKind } from "./rules";

// What the account page and the leads' mail list receive: JSON shapes the client may import.

export interface NotificationSetting {
  kind: MailKind;
  label: string;
  essential: boolean;
  /** For an essential notice: why it cannot be switched off. */
  why: string | null;
  /** Whether this kind of mail goes to one of the caller's roles at all. */
  appliesToYou: boolean;
  on: boolean;
}

export interface MailListRow {
  id: string;
  kind: MailKind;
  toAddress: string;
  userId: string | null;
  subject: string;
  status: "pending" | "sending" | "sent" | "failed";
  attempts: number;
  lastError: string | null;
  createdAt: string;
  sentAt: string | null;
}
