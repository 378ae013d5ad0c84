import { route } from "@/lib/http/route";
import * as drops from "@/lib/drops/service";

// GET /api/work-queue — the drops waiting for the caller's reading.
export const GET = route({ role: "reviewer" }, async ({ actor }) => ({ items: await drops.workQueue(actor) }));
