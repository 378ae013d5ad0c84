import { fileResponse } from "@/lib/http/file-response";
import { idParam, route } from "@/lib/http/route";
import { reportPdf } from "@/lib/reports/service";

// GET /api/submissions/:id/report.pdf — the test report (staff; the manufacturer once released)
export const GET = route({ signedIn: true }, async ({ actor, params }) => fileResponse(await reportPdf(actor, idParam(params, "id", "submission"))));
