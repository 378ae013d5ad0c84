import { idParam, route } from "@/lib/http/route";
import * as readings from "@/lib/readings/service";

// POST /api/readings/:id/submit — submit the caller's draft; from then on it cannot change.
export const POST = route({ role: "reviewer" }, async ({ actor, params }) => ({ drop: await readings.submitReading(actor, idParam(params, "id", "reading")) }));
