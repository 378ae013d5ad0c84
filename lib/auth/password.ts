import "server-only";
import bcrypt from "bcryptjs";
import { env } from "../env";

export async function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, env().BCRYPT_ROUNDS);
}

// Compared against when the account is unknown, so a wrong e-mail costs the same time as a wrong password.
let dummyHash: string | undefined;

export async function verifyPassword(password: string, hash: string | null): Promise<boolean> {
  dummyHash ??= await bcrypt.hash("not-a-password", env().BCRYPT_ROUNDS);
  const ok = await bcrypt.compare(password, hash ?? dummyHash);
  return ok && hash !== null;
}
