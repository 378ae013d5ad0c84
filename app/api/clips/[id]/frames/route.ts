import * as clips from "@/lib/clips/service";
import { idParam, route } from "@/lib/http/route";

// GET /api/clips/:id/frames — the frame index: every frame's pts in display order, and the time base.
export const GET = route({ signedIn: true }, async ({ actor, params }) => clips.getFrameIndex(actor, idParam(params, "id", "clip")));
