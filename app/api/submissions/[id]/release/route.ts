import { idParam, route } from "@/lib/http/route";
import { getRelease } from "@/lib/signoff/release";

// GET /api/submissions/:id/release — whether the results are released, and by whose signature
export const GET = route({ signedIn: true }, async ({ actor, params }) => getRelease(actor, idParam(params, "id", "submission")));
