import { idParam, route } from "@/lib/http/route";
import { marksSchema } from "@/lib/readings/schema";
import * as readings from "@/lib/readings/service";

// POST /api/drops/:id/readings — start the caller's reading of a drop (or continue their draft), with any marks.
export const POST = route({ role: "reviewer", body: marksSchema }, async ({ actor, params, body }) => ({
  drop: await readings.startReading(actor, idParam(params, "id", "drop"), body),
}));
