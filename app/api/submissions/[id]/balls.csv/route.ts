import { fileResponse } from "@/lib/http/file-response";
import { idParam, route } from "@/lib/http/route";
import { ballsExport } from "@/lib/reports/service";

// GET /api/submissions/:id/balls.csv — one row per ball (columns in DEVELOPERS.md)
export const GET = route({ signedIn: true }, async ({ actor, params }) => fileResponse(await ballsExport(actor, idParam(params, "id", "submission"))));
