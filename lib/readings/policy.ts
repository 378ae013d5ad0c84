import type { Actor } from "../auth/actor";
import { AppError } from "../errors";
import { hasRole, isStaff } from "../users/rules";

// Who may read drops, and what a reader may see. Pure.
//
// Blind rule: until both readings of a drop are submitted, anyone who holds the reviewer role
// (whatever else they hold) sees only their own reading of it: not the other's marks or times, not
// whether it exists, not the drop's state, and not which slot their own reading fills.

export function assertReviewer(actor: Actor, doing: string): void {
  if (!hasRole(actor, "reviewer")) throw new AppError("forbidden", `Only a reviewer can ${doing}.`);
}

export function assertCanPlaceDrops(actor: Actor): void {
  if (!hasRole(actor, "technician") && !hasRole(actor, "lead")) throw new AppError("forbidden", "Only a technician or a lead can place drops on clips.");
}

/** Drops and readings are lab records: manufacturers see results and reports, not readings. */
export function assertCanSeeDrops(actor: Actor): void {
  if (!isStaff(actor)) throw new AppError("not_found", "No such drop.");
}

export function isReviewer(actor: Actor): boolean {
  return hasRole(actor, "reviewer");
}

export function isBlindFor(actor: Actor, currentReadingCount: number): boolean {
  return isReviewer(actor) && currentReadingCount < 2;
}

/** Others' readings are hidden from a blind reader exactly as a missing one would be. */
export function canSeeReading(actor: Actor, reading: { reviewerId: string }, blind: boolean): boolean {
  return !blind || reading.reviewerId === actor.id;
}
