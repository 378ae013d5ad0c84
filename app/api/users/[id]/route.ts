import { idParam, route } from "@/lib/http/route";
import { userUpdateSchema } from "@/lib/users/schema";
import * as users from "@/lib/users/service";

// PATCH /api/users/:id — change name or roles, deactivate or reactivate.
export const PATCH = route({ role: "lead", body: userUpdateSchema }, async ({ actor, params, body }) => ({
  user: await users.updateUser(actor, idParam(params, "id", "user"), body),
}));
