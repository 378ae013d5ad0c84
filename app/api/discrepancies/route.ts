import { route } from "@/lib/http/route";
import * as drops from "@/lib/drops/service";

// GET /api/discrepancies — the leads' queue: drops whose readings disagree, oldest first.
export const GET = route({ role: "lead" }, async ({ actor }) => ({ drops: await drops.discrepancyQueue(actor) }));
