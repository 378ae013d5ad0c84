import * as uploads from "@/lib/uploads/service";
import { idParam, route } from "@/lib/http/route";

// POST /api/clips/:id/complete — finish the upload and start processing; a second call changes nothing.
export const POST = route({ signedIn: true }, async ({ actor, params }) => uploads.completeUpload(actor, idParam(params, "id", "clip")));
