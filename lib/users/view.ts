import type { UserRow } from "./queries";
import { statusOf, type Role, type UserStatus } from "./rules";

/** What the API shows of a user: never the password hash. */
export interface UserView {
  id: string;
  email: string;
  name: string;
  roles: Role[];
  organisationId: string | null;
  organisationName: string | null;
  status: UserStatus;
  createdAt: string;
}

export function toUserView(u: UserRow): UserView {
  return {
    id: u.id,
    email: u.email,
    name: u.name,
    roles: u.roles,
    organisationId: u.organisationId,
    organisationName: u.organisationName,
    status: statusOf({ active: u.active, hasPassword: u.passwordHash !== null }),
    createdAt: u.createdAt.toISOString(),
  };
}

/** The audited snapshot of a user: what a lead can change, nothing secret. */
export function auditSnapshot(u: UserRow) {
  return { email: u.email, name: u.name, roles: u.roles, organisationId: u.organisationId, active: u.active };
}
