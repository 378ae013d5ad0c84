import { editionInputSchema } from "@/lib/editions/schema";
import * as editions from "@/lib/editions/service";
import { route } from "@/lib/http/route";

// GET /api/editions — every specification edition, newest first, with how many submissions use it.
export const GET = route({ role: ["technician", "reviewer", "lead"] }, async ({ actor }) => ({ editions: await editions.listEditions(actor) }));

// POST /api/editions — a new edition (optionally made from an older one).
export const POST = route({ role: "lead", body: editionInputSchema, status: 201 }, async ({ actor, body }) => ({
  edition: await editions.createEdition(actor, body),
}));
