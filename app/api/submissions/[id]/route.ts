import { idParam, route } from "@/lib/http/route";
import { submissionUpdateSchema } from "@/lib/submissions/schema";
import * as submissions from "@/lib/submissions/service";

// GET /api/submissions/:id — staff get samples by round with runs and flags; a manufacturer its summary.
export const GET = route({ signedIn: true }, async ({ actor, params }) => submissions.getSubmission(actor, idParam(params, "id", "submission")));

// PATCH /api/submissions/:id — model name, weight classes, notes.
export const PATCH = route({ signedIn: true, body: submissionUpdateSchema }, async ({ actor, params, body }) => ({
  submission: await submissions.updateSubmission(actor, idParam(params, "id", "submission"), body),
}));
