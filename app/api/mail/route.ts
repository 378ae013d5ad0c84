import { route } from "@/lib/http/route";
import { listMail, mailListQuerySchema } from "@/lib/notifications/service";

// GET /api/mail — the lab's outgoing mail with its delivery status (leads)
export const GET = route({ role: "lead", query: mailListQuerySchema }, async ({ actor, query }) => ({ mail: await listMail(actor, query) }));
