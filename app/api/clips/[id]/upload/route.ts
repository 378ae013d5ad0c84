import * as uploads from "@/lib/uploads/service";
import { idParam, route } from "@/lib/http/route";

// GET /api/clips/:id/upload — the parts the server has recorded, to resume an interrupted upload.
export const GET = route({ signedIn: true }, async ({ actor, params }) => uploads.uploadState(actor, idParam(params, "id", "clip")));
