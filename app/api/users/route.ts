import { route } from "@/lib/http/route";
import { inviteInputSchema } from "@/lib/users/schema";
import * as users from "@/lib/users/service";

// GET /api/users — every account, for the lead's user page.
export const GET = route({ role: "lead" }, async ({ actor }) => ({ users: await users.listUsers(actor) }));

// POST /api/users — invite a person by e-mail; the account waits for them to set a password.
export const POST = route({ role: "lead", body: inviteInputSchema, status: 201 }, async ({ actor, body }) => ({
  user: await users.inviteUser(actor, body),
}));
