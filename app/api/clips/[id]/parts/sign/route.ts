import { signPartsSchema } from "@/lib/clips/schema";
import * as uploads from "@/lib/uploads/service";
import { idParam, route } from "@/lib/http/route";

// POST /api/clips/:id/parts/sign — presigned URLs for the browser to PUT these parts to storage.
export const POST = route({ signedIn: true, body: signPartsSchema }, async ({ actor, params, body }) =>
  uploads.signParts(actor, idParam(params, "id", "clip"), body.partNumbers),
);
