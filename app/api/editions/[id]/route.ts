import { editionInputSchema } from "@/lib/editions/schema";
import * as editions from "@/lib/editions/service";
import { idParam, route } from "@/lib/http/route";

// GET /api/editions/:id — one edition and the submissions judged against it.
export const GET = route({ role: ["technician", "reviewer", "lead"] }, async ({ actor, params }) => ({
  edition: await editions.getEdition(actor, idParam(params, "id", "edition")),
}));

// PUT /api/editions/:id — replace the values of an edition no submission uses yet.
export const PUT = route({ role: "lead", body: editionInputSchema }, async ({ actor, params, body }) => ({
  edition: await editions.updateEdition(actor, idParam(params, "id", "edition"), body),
}));
