import { idParam, route } from "@/lib/http/route";
import { getSubmissionResults } from "@/lib/results/service";

// GET /api/submissions/:id/results — ball results and the staged decision, computed from settled drops
export const GET = route({ signedIn: true }, async ({ actor, params }) => getSubmissionResults(actor, idParam(params, "id", "submission")));
