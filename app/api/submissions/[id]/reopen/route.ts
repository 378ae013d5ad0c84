import { idParam, route } from "@/lib/http/route";
import { reopenSchema } from "@/lib/signoff/schema";
import * as signoff from "@/lib/signoff/service";

// POST /api/submissions/:id/reopen — a lead re-opens signed-off results, with a reason: the next revision begins.
export const POST = route({ role: "lead", body: reopenSchema, status: 201 }, async ({ actor, params, body }) => ({
  signOff: await signoff.reopen(actor, idParam(params, "id", "submission"), body),
}));
