import "server-only";
import type { Db } from "../db";

// Who may get a reviewer digest on a given day.

export interface DigestReviewer {
  userId: string;
  email: string;
  name: string;
  optOut: string[];
}

/**
 * Active reviewers who have set a password (an invitation not yet taken up gets no digest), who did
 * not switch the digest off and have no digest of this day yet. `only` narrows to some reviewers.
 */
export async function listDigestReviewers(q: Db, day: string, only?: readonly string[]): Promise<DigestReviewer[]> {
  const b = q("users as u")
    .where("u.active", true)
    .whereNotNull("u.password_hash")
    .whereRaw("'reviewer' = any(u.roles)")
    .whereRaw("not ('reviewer.digest' = any(u.notification_opt_out))")
    .whereNotExists((e) => e.select(q.raw("1")).from("outbox as o").whereRaw("o.dedupe_key like 'digest:' || u.id || ':' || ? || ':%'", [day]))
    .orderBy("u.email")
    .select("u.id as userId", "u.email", "u.name", "u.notification_opt_out as optOut");
  if (only) b.whereIn("u.id", only);
  return b;
}
