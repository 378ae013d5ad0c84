import { idParam, route } from "@/lib/http/route";
import { acknowledgeInputSchema } from "@/lib/sample-requests/schema";
import { acknowledgeRequest } from "@/lib/sample-requests/service";

// POST /api/sample-requests/:id/acknowledge — the manufacturer acknowledges and gives shipping details
export const POST = route({ role: "manufacturer", body: acknowledgeInputSchema }, async ({ actor, params, body }) => ({
  request: await acknowledgeRequest(actor, idParam(params, "id", "request"), body),
}));
