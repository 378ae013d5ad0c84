import "server-only";
import type { Actor } from "../auth/actor";
import { db } from "../db";
import { assertCanSeeAgreement } from "./policy";
import { listReadingPairs, PAIR_LIMIT } from "./queries";
import { summariseAgreement, type AgreementReport } from "./rules";
import { rangeInstants, type AgreementQuery } from "./schema";

/** How the two blind readings agreed over drops settled in a period (whole UTC days). */
export async function reviewerAgreement(actor: Actor, q: AgreementQuery): Promise<AgreementReport> {
  assertCanSeeAgreement(actor);
  const { pairs, truncated } = await listReadingPairs(db(), rangeInstants(q));
  return { from: q.from, to: q.to, truncatedAt: truncated ? PAIR_LIMIT : null, ...summariseAgreement(pairs) };
}
