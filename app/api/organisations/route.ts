import { route } from "@/lib/http/route";
import { listOrganisations } from "@/lib/organisations/service";

// GET /api/organisations — manufacturers, for attaching a manufacturer account.
export const GET = route({ role: "lead" }, async ({ actor }) => ({ organisations: await listOrganisations(actor) }));
