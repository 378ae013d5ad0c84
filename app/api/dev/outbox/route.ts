import { route } from "@/lib/http/route";
import { listFakeMessages } from "@/lib/mailbox/service";

// GET /api/dev/outbox — what the local SMTP fake received (404 unless the fake is configured).
export const GET = route({ role: "lead" }, async ({ actor }) => ({ messages: await listFakeMessages(actor) }));
