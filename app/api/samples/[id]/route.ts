import { idParam, route } from "@/lib/http/route";
import { sampleUpdateSchema } from "@/lib/samples/schema";
import * as samples from "@/lib/samples/service";

// PATCH /api/samples/:id — correct serial, weight, acclimation start or notes.
export const PATCH = route({ signedIn: true, body: sampleUpdateSchema }, async ({ actor, params, body }) => ({
  sample: await samples.updateSample(actor, idParam(params, "id", "sample"), body),
}));

// DELETE /api/samples/:id — a sample entered by mistake (refused once it has runs).
export const DELETE = route({ signedIn: true }, async ({ actor, params }) => samples.deleteSample(actor, idParam(params, "id", "sample")));
