import { fileResponse } from "@/lib/http/file-response";
import { idParam, route } from "@/lib/http/route";
import { dropsExport } from "@/lib/reports/service";

// GET /api/submissions/:id/drops.csv — one row per drop (columns in DEVELOPERS.md)
export const GET = route({ signedIn: true }, async ({ actor, params }) => fileResponse(await dropsExport(actor, idParam(params, "id", "submission"))));
