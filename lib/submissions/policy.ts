import type { Actor } from "../auth/actor";
import { AppError } from "../errors";
import { hasAnyRole, hasRole, isStaff } from "../users/rules";

// Who may see and change intake records (submissions and everything under them). Pure.

/** Staff see every organisation's records; a manufacturer only its own. */
export function canSeeOrganisation(actor: Actor, organisationId: string): boolean {
  return isStaff(actor) || (hasRole(actor, "manufacturer") && actor.organisationId === organisationId);
}

/** Another organisation's record does not exist, as far as a manufacturer can tell. */
export function assertVisible(actor: Actor, organisationId: string, what: string): void {
  if (!canSeeOrganisation(actor, organisationId)) throw new AppError("not_found", `No such ${what}.`);
}

export function canEditIntake(actor: Actor): boolean {
  return hasAnyRole(actor, ["technician", "lead"]);
}

export function assertCanEditIntake(actor: Actor): void {
  if (!canEditIntake(actor)) throw new AppError("forbidden", "Only a technician or a lead can change intake records.");
}

export function assertStaff(actor: Actor, what: string): void {
  if (!isStaff(actor)) throw new AppError("not_found", `No such ${what}.`);
}

export function assertLead(actor: Actor, doing: string): void {
  if (!hasRole(actor, "lead")) throw new AppError("forbidden", `Only a lead can ${doing}.`);
}
