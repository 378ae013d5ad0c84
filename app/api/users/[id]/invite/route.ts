import { idParam, route } from "@/lib/http/route";
import * as users from "@/lib/users/service";

// POST /api/users/:id/invite — send a fresh invitation link; earlier links stop working.
export const POST = route({ role: "lead" }, async ({ actor, params }) => ({
  user: await users.reinviteUser(actor, idParam(params, "id", "user")),
}));
