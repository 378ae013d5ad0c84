import type { Actor } from "../auth/actor";
import { AppError } from "../errors";
import { hasRole } from "../users/rules";

// Who may rule on a drop. Pure.

export function assertCanRule(actor: Actor): void {
  if (!hasRole(actor, "lead")) throw new AppError("forbidden", "Only a lead can rule on a discrepancy.");
}

/** A lead who gave one of the two readings is a party to the disagreement: another lead rules. */
export function assertNotAParty(actor: Actor, readerIds: readonly string[]): void {
  if (readerIds.includes(actor.id)) {
    throw new AppError("forbidden", "You read this drop yourself, so you cannot rule on it: another lead must rule.");
  }
}
