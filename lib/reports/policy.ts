import type { Actor } from "../auth/actor";
import type { SubmissionRow } from "../submissions/queries";
import { assertReleasedTo } from "../signoff/release-policy";

/** Staff see a submission's report and exports at any time; its manufacturer once it is released. */
export function assertCanSeeReport(actor: Actor, s: Pick<SubmissionRow, "status">, signedBefore: boolean): void {
  assertReleasedTo(actor, s, signedBefore, "report");
}
