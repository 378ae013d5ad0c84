import { idParam, route } from "@/lib/http/route";
import { sampleImportSchema } from "@/lib/samples/schema";
import * as samples from "@/lib/samples/service";

// POST /api/submissions/:id/samples/import — a CSV of serials and weights; all rows or none.
export const POST = route({ signedIn: true, body: sampleImportSchema, status: 201 }, async ({ actor, params, body }) =>
  samples.importSamples(actor, idParam(params, "id", "submission"), body),
);
