import { idParam, route } from "@/lib/http/route";
import * as drops from "@/lib/drops/service";

// GET /api/drops/:id — one drop with the readings the caller may see (blind until both are in).
export const GET = route({ signedIn: true }, async ({ actor, params }) => ({ drop: await drops.getDrop(actor, idParam(params, "id", "drop")) }));
