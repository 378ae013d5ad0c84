import type { Actor } from "../auth/actor";
import { AppError } from "../errors";
import { hasRole } from "./rules";

// Pure permission checks: (actor, thing) → allowed? Services call assert* before doing anything.

export function canManageUsers(actor: Actor): boolean {
  return hasRole(actor, "lead");
}

export function assertCanManageUsers(actor: Actor): void {
  if (!canManageUsers(actor)) throw new AppError("forbidden", "Only a lead can manage users.");
}

export function canReadOutbox(actor: Actor): boolean {
  return hasRole(actor, "lead");
}
