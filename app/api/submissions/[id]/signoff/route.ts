import { idParam, route } from "@/lib/http/route";
import { signSchema } from "@/lib/signoff/schema";
import * as signoff from "@/lib/signoff/service";

// GET /api/submissions/:id/signoff — revision in force, whether it is locked, signatures and re-openings.
export const GET = route({ role: "lead" }, async ({ actor, params }) => ({
  signOff: await signoff.getSignOff(actor, idParam(params, "id", "submission")),
}));

// POST /api/submissions/:id/signoff — a lead signs the results off, re-entering their password.
export const POST = route({ role: "lead", body: signSchema, status: 201 }, async ({ actor, params, body }) => ({
  signOff: await signoff.signOff(actor, idParam(params, "id", "submission"), body),
}));
