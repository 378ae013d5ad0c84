import { idParam, route } from "@/lib/http/route";
import { marksSchema } from "@/lib/readings/schema";
import * as readings from "@/lib/readings/service";

const id = (params: Record<string, string | string[]>) => idParam(params, "id", "reading");

// GET /api/readings/:id — one reading, if the caller may see it.
export const GET = route({ signedIn: true }, async ({ actor, params }) => ({ reading: await readings.getReading(actor, id(params)) }));

// PATCH /api/readings/:id — set or clear the marks of the caller's draft.
export const PATCH = route({ role: "reviewer", body: marksSchema }, async ({ actor, params, body }) => ({
  drop: await readings.saveMarks(actor, id(params), body),
}));

// DELETE /api/readings/:id — discard the caller's draft (a submitted reading stays for good).
export const DELETE = route({ role: "reviewer" }, async ({ actor, params }) => ({ drop: await readings.discardDraft(actor, id(params)) }));
