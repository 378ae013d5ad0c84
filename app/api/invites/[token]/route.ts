import { param, route } from "@/lib/http/route";
import { acceptInvite, describeInvite } from "@/lib/users/invites";
import { acceptInviteSchema } from "@/lib/users/schema";

// GET /api/invites/:token — whether the link still works, and for whom.
export const GET = route({ public: true }, async ({ params }) => describeInvite(param(params, "token")));

// POST /api/invites/:token — set the password; the link then stops working.
export const POST = route({ public: true, body: acceptInviteSchema }, async ({ params, body }) => acceptInvite(param(params, "token"), body.password));
