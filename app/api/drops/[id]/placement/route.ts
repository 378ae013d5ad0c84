import { idParam, route } from "@/lib/http/route";
import * as drops from "@/lib/drops/service";
import { placementSchema } from "@/lib/readings/schema";

// PUT /api/drops/:id/placement — put the drop on one of its run's clips, near its dispense frame.
export const PUT = route({ signedIn: true, body: placementSchema }, async ({ actor, params, body }) => ({
  drop: await drops.placeDrop(actor, idParam(params, "id", "drop"), body),
}));
