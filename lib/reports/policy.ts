import type { Actor } from "../auth/actor";
import { AppError } from "../errors";
import type { SubmissionRow } from "../submissions/queries";
import { isStaff } from "../users/rules";

/** Staff see a submission's report and exports at any time; its manufacturer once it is released. */
export function assertCanSeeReport(actor: Actor, s: Pick<SubmissionRow, "status">): void {
  if (isStaff(actor) || s.status === "released") return;
  throw new AppError("forbidden", "The lab shows the report to the manufacturer once a lead has released the results.");
}
