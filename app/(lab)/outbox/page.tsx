import { notFound } from "next/navigation";
import { Notice } from "@/components/ui/notice";
import { requirePageActor } from "@/lib/auth/page-guard";
import { outboxEnabled } from "@/lib/mailbox/service";
import { OutboxList } from "./_components/outbox-list";

export const metadata = { title: "Outbox" };

export default async function OutboxPage() {
  await requirePageActor(["lead"]);
  if (!outboxEnabled()) notFound();
  return (
    <div className="space-y-6">
      <h1 className="text-3xl font-bold">Outbox</h1>
      <Notice>Development only: these are the messages the local mail fake received. With a real SMTP server configured this page does not exist.</Notice>
      <OutboxList />
    </div>
  );
}
