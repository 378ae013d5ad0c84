import { route } from "@/lib/http/route";
import { organisationInputSchema } from "@/lib/organisations/schema";
import * as organisations from "@/lib/organisations/service";

const STAFF = ["technician", "reviewer", "lead"] as const;

// GET /api/organisations — manufacturers, for intake forms, filters and accounts.
export const GET = route({ role: [...STAFF] }, async ({ actor }) => ({ organisations: await organisations.listOrganisations(actor) }));

// POST /api/organisations — add a manufacturer with its contact addresses.
export const POST = route({ role: "lead", body: organisationInputSchema, status: 201 }, async ({ actor, body }) => ({
  organisation: await organisations.createOrganisation(actor, body),
}));
