import { idParam, route } from "@/lib/http/route";
import * as drops from "@/lib/drops/service";

// GET /api/runs/:id/drops — the run's drops, where each sits on a clip, and what the caller may see of their readings.
export const GET = route({ signedIn: true }, async ({ actor, params }) => ({ drops: await drops.listRunDrops(actor, idParam(params, "id", "run")) }));
