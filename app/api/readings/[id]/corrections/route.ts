import { idParam, route } from "@/lib/http/route";
import { correctionSchema } from "@/lib/readings/schema";
import * as readings from "@/lib/readings/service";

// POST /api/readings/:id/corrections — start a correction of the caller's submitted reading, with a reason.
export const POST = route({ role: "reviewer", body: correctionSchema, status: 201 }, async ({ actor, params, body }) => ({
  drop: await readings.correctReading(actor, idParam(params, "id", "reading"), body.reason),
}));
