import { route } from "@/lib/http/route";
import { auditQuerySchema } from "@/lib/audit/schema";
import * as audit from "@/lib/audit/service";

// GET /api/audit — audit events, newest first, filtered by who, action, record and date; paged.
export const GET = route({ role: "lead", query: auditQuerySchema }, async ({ actor, query }) => audit.listAudit(actor, query));
