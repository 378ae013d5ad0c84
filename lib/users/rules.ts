// Roles and the pure rules about them. No I/O here.

export const ROLES = ["technician", "reviewer", "lead", "manufacturer"] as const;
export type Role = (typeof ROLES)[number];
export const STAFF_ROLES: readonly Role[] = ["technician", "reviewer", "lead"];

export const ROLE_LABELS: Record<Role, string> = {
  technician: "Technician",
  reviewer: "Reviewer",
  lead: "Lead",
  manufacturer: "Manufacturer",
};

export type UserStatus = "active" | "invited" | "deactivated";

export function hasRole(holder: { roles: readonly Role[] }, role: Role): boolean {
  return holder.roles.includes(role);
}

export function hasAnyRole(holder: { roles: readonly Role[] }, roles: readonly Role[]): boolean {
  return roles.some((r) => holder.roles.includes(r));
}

export function isStaff(holder: { roles: readonly Role[] }): boolean {
  return hasAnyRole(holder, STAFF_ROLES);
}

/**
 * A role set is valid when it is not empty, and a manufacturer account holds no lab role and
 * belongs to an organisation (lab staff belong to none): a manufacturer must never see lab-wide data.
 * Returns the problem in words, or null.
 */
export function roleSetProblem(roles: readonly Role[], organisationId: string | null | undefined): string | null {
  if (roles.length === 0) return "Choose at least one role.";
  const manufacturer = roles.includes("manufacturer");
  if (manufacturer && roles.length > 1) return "A manufacturer account cannot also hold a lab role.";
  if (manufacturer && !organisationId) return "A manufacturer account must belong to an organisation.";
  if (!manufacturer && organisationId) return "Only manufacturer accounts belong to an organisation.";
  return null;
}

export function statusOf(user: { active: boolean; hasPassword: boolean }): UserStatus {
  if (!user.active) return "deactivated";
  return user.hasPassword ? "active" : "invited";
}

/** A lead may not lock the lab out by removing their own lead role or deactivating themselves. */
export function selfChangeProblem(actorId: string, targetId: string, change: { roles?: readonly Role[]; active?: boolean }): string | null {
  if (actorId !== targetId) return null;
  if (change.active === false) return "You cannot deactivate your own account; ask another lead.";
  if (change.roles && !change.roles.includes("lead")) return "You cannot remove your own lead role; ask another lead.";
  return null;
}
