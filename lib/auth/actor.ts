import type { Role } from "../users/rules";

/** The signed-in person a service acts for, re-read from the database on every request. */
export interface Actor {
  id: string;
  email: string;
  name: string;
  roles: Role[];
  organisationId: string | null;
  requestId: string;
}
