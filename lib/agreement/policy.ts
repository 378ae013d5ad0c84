import type { Actor } from "../auth/actor";
import { assertLead } from "../submissions/policy";

// Who may see how the reviewers agree. Pure. Only leads: it names reviewers and their bias.
export function assertCanSeeAgreement(actor: Actor): void {
  assertLead(actor, "see how the reviewers agree");
}
