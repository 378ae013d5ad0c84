import "server-only";
import type { Db } from "../db";

export async function insertSignInAttempt(q: Db, a: { email: string; address: string; succeeded: boolean }): Promise<void> {
  await q("sign_in_attempts").insert(a);
}

/** Failed attempts inside the window that came after the last success for the same key. */
export async function recentFailures(q: Db, key: "email" | "address", value: string, sinceSeconds: number): Promise<Date[]> {
  const lastSuccess = q("sign_in_attempts").where(key, value).andWhere("succeeded", true).max("at");
  const rows = await q("sign_in_attempts")
    .where(key, value)
    .andWhere("succeeded", false)
    .andWhere("at", ">", q.raw(`now() - make_interval(secs => ?)`, [sinceSeconds]))
    .andWhere("at", ">", q.raw(`coalesce((?), '-infinity'::timestamptz)`, [lastSuccess]))
    .select("at");
  return rows.map((r) => r.at as Date);
}
