import "server-only";
import { createHash, randomBytes } from "node:crypto";

/** A fresh invite token; only its hash is stored, so a database leak reveals no usable link. */
export function newToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString("base64url");
  return { token, hash: hashToken(token) };
}

export function hashToken(token: string): string {
  return createHash("sha256").update(token).digest("hex");
}
