import { startUploadSchema } from "@/lib/clips/schema";
import * as clips from "@/lib/clips/service";
import * as uploads from "@/lib/uploads/service";
import { idParam, route } from "@/lib/http/route";

// GET /api/runs/:id/clips — the run's recordings with their processing state.
export const GET = route({ signedIn: true }, async ({ actor, params }) => ({ clips: await clips.listRunClips(actor, idParam(params, "id", "run")) }));

// POST /api/runs/:id/clips — start uploading a recording: a clip record and a multipart upload.
export const POST = route({ signedIn: true, body: startUploadSchema, status: 201 }, async ({ actor, params, body }) =>
  uploads.startUpload(actor, idParam(params, "id", "run"), body),
);
