import { idParam, route } from "@/lib/http/route";
import { runInputSchema } from "@/lib/runs/schema";
import * as runs from "@/lib/runs/service";

// POST /api/samples/:id/runs — record an oil absorption test of the sample and its conditions.
export const POST = route({ signedIn: true, body: runInputSchema, status: 201 }, async ({ actor, params, body }) => ({
  run: await runs.recordRun(actor, idParam(params, "id", "sample"), body),
}));
