import { route } from "@/lib/http/route";

// GET /api/me — who is signed in, with roles as the database has them now.
export const GET = route({ signedIn: true }, async ({ actor }) => ({
  id: actor.id,
  email: actor.email,
  name: actor.name,
  roles: actor.roles,
  organisationId: actor.organisationId,
}));
