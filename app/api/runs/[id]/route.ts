import { idParam, route } from "@/lib/http/route";
import { runInputSchema } from "@/lib/runs/schema";
import * as runs from "@/lib/runs/service";

// GET /api/runs/:id — a run's conditions, derived values and warnings.
export const GET = route({ signedIn: true }, async ({ actor, params }) => ({ run: await runs.getRun(actor, idParam(params, "id", "run")) }));

// PUT /api/runs/:id — replace the conditions (clears an earlier acceptance).
export const PUT = route({ signedIn: true, body: runInputSchema }, async ({ actor, params, body }) => ({
  run: await runs.updateRun(actor, idParam(params, "id", "run"), body),
}));
