import { idParam, route } from "@/lib/http/route";
import { sampleRequestInputSchema } from "@/lib/sample-requests/schema";
import { listSampleRequests, requestSamples } from "@/lib/sample-requests/service";

// GET /api/submissions/:id/sample-requests — the requests for more samples (staff, or the owning manufacturer)
export const GET = route({ signedIn: true }, async ({ actor, params }) => ({ requests: await listSampleRequests(actor, idParam(params, "id", "submission")) }));

// POST /api/submissions/:id/sample-requests — ask the manufacturer for the next round's samples
export const POST = route({ role: ["technician", "lead"], body: sampleRequestInputSchema, status: 201 }, async ({ actor, params, body }) => ({
  request: await requestSamples(actor, idParam(params, "id", "submission"), body),
}));
