import { idParam, route } from "@/lib/http/route";
import { runVoidSchema } from "@/lib/runs/schema";
import * as runs from "@/lib/runs/service";

// POST /api/runs/:id/void — a lead voids a run that must not count, with a written reason (final; nothing is deleted).
export const POST = route({ signedIn: true, body: runVoidSchema }, async ({ actor, params, body }) => ({
  run: await runs.voidRun(actor, idParam(params, "id", "run"), body.reason),
}));
