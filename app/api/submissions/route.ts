import { route } from "@/lib/http/route";
import { submissionInputSchema, submissionListSchema } from "@/lib/submissions/schema";
import * as submissions from "@/lib/submissions/service";

// GET /api/submissions — a page of submissions (a manufacturer's own only), filtered and sorted.
export const GET = route({ signedIn: true, query: submissionListSchema }, async ({ actor, query }) => submissions.listSubmissions(actor, query));

// POST /api/submissions — log a received submission; the edition in force on its date is pinned.
export const POST = route({ role: ["technician", "lead"], body: submissionInputSchema, status: 201 }, async ({ actor, body }) => ({
  submission: await submissions.createSubmission(actor, body),
}));
