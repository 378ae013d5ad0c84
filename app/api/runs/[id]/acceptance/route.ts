import { idParam, route } from "@/lib/http/route";
import { runAcceptanceSchema } from "@/lib/runs/schema";
import * as runs from "@/lib/runs/service";

// POST /api/runs/:id/acceptance — a lead accepts flagged conditions, with a written reason.
export const POST = route({ signedIn: true, body: runAcceptanceSchema }, async ({ actor, params, body }) => ({
  run: await runs.acceptRun(actor, idParam(params, "id", "run"), body.reason),
}));
