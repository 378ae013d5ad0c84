import { route } from "@/lib/http/route";
import { checkHealth } from "@/lib/health";

// GET /api/health — database reachable; for load balancers and the start script.
export const GET = route({ public: true }, async () => checkHealth());
