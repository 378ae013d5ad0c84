import "server-only";
import { db, pingDb } from "./db";
import { AppError } from "./errors";

export async function checkHealth(): Promise<{ ok: true }> {
  try {
    await pingDb(db());
  } catch (err) {
    throw new AppError("unavailable", "The database is not answering.", { cause: err });
  }
  return { ok: true };
}
