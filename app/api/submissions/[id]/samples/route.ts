import { idParam, route } from "@/lib/http/route";
import { sampleInputSchema } from "@/lib/samples/schema";
import * as samples from "@/lib/samples/service";

// POST /api/submissions/:id/samples — one received sample ball.
export const POST = route({ signedIn: true, body: sampleInputSchema, status: 201 }, async ({ actor, params, body }) => ({
  sample: await samples.addSample(actor, idParam(params, "id", "submission"), body),
}));
