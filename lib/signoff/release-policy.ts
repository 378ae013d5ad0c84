import type { Actor } from "../auth/actor";
import { AppError } from "../errors";
import type { SubmissionRow } from "../submissions/queries";
import { isStaff } from "../users/rules";

// What a manufacturer may see of its own submission's results. Pure. Staff see them at any time;
// the manufacturer once a lead has signed them off (status released). While a lead has re-opened
// a signed submission, the manufacturer is told the results are being revised: the report is
// computed from the records as they are now, so an earlier revision's report cannot be rebuilt
// faithfully, and the records of the new revision are not signed yet.

export const NOT_RELEASED = {
  results: "The lab shows results to the manufacturer once a lead has released them.",
  report: "The lab shows the report to the manufacturer once a lead has released the results.",
} as const;

export const BEING_REVISED =
  "The lab has re-opened these results to revise them. The revised results and report are shown here once a lead signs them off again.";

export const isReleasedTo = (actor: Actor, s: Pick<SubmissionRow, "status">): boolean => isStaff(actor) || s.status === "released";

/** Refuses the results or the report to a manufacturer before release; `signedBefore`: an earlier revision was signed. */
export function assertReleasedTo(actor: Actor, s: Pick<SubmissionRow, "status">, signedBefore: boolean, what: keyof typeof NOT_RELEASED): void {
  if (isReleasedTo(actor, s)) return;
  throw new AppError("forbidden", signedBefore ? BEING_REVISED : NOT_RELEASED[what]);
}
