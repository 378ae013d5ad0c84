import { idParam, route } from "@/lib/http/route";
import { organisationUpdateSchema } from "@/lib/organisations/schema";
import * as organisations from "@/lib/organisations/service";

// PATCH /api/organisations/:id — rename, or change the contact addresses for notices.
export const PATCH = route({ role: "lead", body: organisationUpdateSchema }, async ({ actor, params, body }) => ({
  organisation: await organisations.updateOrganisation(actor, idParam(params, "id", "organisation"), body),
}));
