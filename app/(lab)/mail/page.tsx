import Link from "next/link";
import { Notice } from "@/components/ui/notice";
import { requirePageActor } from "@/lib/auth/page-guard";
import { outboxEnabled } from "@/lib/mailbox/service";
import { MailTable } from "./_components/mail-table";

export const metadata = { title: "Sent mail" };

// The leads' view of the outbox table: every notice the lab sends, with its delivery state.
export default async function SentMailPage() {
  await requirePageActor(["lead"]);
  return (
    <div className="space-y-6">
      <div className="space-y-2">
        <h1 className="text-3xl font-bold">Sent mail</h1>
        <p className="text-ink-800">
          Each notice is written when its event happens and sent by the worker, which retries while the mail server is unreachable. A message that keeps failing
          stops after its last attempt and stays here as failed, with the error.
        </p>
      </div>
      {outboxEnabled() && (
        <Notice>
          Development: the local mail fake receives these messages; read them as delivered on the{" "}
          <Link href="/outbox" className="font-semibold underline">
            Outbox
          </Link>{" "}
          page.
        </Notice>
      )}
      <MailTable />
    </div>
  );
}
