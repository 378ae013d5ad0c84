import type { Actor } from "../auth/actor";
import { AppError } from "../errors";
import { hasRole } from "../users/rules";

// Who may act on a request for more samples. Pure. (Asking is an intake change: assertCanEditIntake.)

export function assertCanAcknowledge(actor: Actor): void {
  if (!hasRole(actor, "manufacturer")) throw new AppError("forbidden", "Only the manufacturer acknowledges a request for samples.");
}
