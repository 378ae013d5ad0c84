import * as agreement from "@/lib/agreement/service";
import { agreementQuerySchema } from "@/lib/agreement/schema";
import { route } from "@/lib/http/route";

// GET /api/agreement?from=YYYY-MM-DD&to=YYYY-MM-DD — how the two blind readings agreed (leads only).
export const GET = route({ role: "lead", query: agreementQuerySchema }, async ({ actor, query }) => ({
  agreement: await agreement.reviewerAgreement(actor, query),
}));
