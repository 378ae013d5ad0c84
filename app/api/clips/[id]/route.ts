import * as clips from "@/lib/clips/service";
import { idParam, route } from "@/lib/http/route";

// GET /api/clips/:id — one clip: each processing step's state, the index summary, playback links.
export const GET = route({ signedIn: true }, async ({ actor, params }) => ({ clip: await clips.getClip(actor, idParam(params, "id", "clip")) }));
