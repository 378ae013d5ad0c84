import { idParam, route } from "@/lib/http/route";
import { rulingSchema } from "@/lib/rulings/schema";
import * as rulings from "@/lib/rulings/service";

// GET /api/drops/:id/ruling — the lead's ruling on a drop (null while none is made).
export const GET = route({ signedIn: true }, async ({ actor, params }) => ({
  ruling: await rulings.getRuling(actor, idParam(params, "id", "drop")),
}));

// POST /api/drops/:id/ruling — a lead settles a discrepancy: the first or second reading, or a third, with a reason.
export const POST = route({ role: "lead", body: rulingSchema, status: 201 }, async ({ actor, params, body }) => ({
  ruling: await rulings.ruleDrop(actor, idParam(params, "id", "drop"), body),
}));
