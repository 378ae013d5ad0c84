import { requirePageActor } from "@/lib/auth/page-guard";
import { QueueTable } from "./_components/queue-table";

export const metadata = { title: "Reading queue" };

export default async function QueuePage() {
  await requirePageActor(["reviewer"]);
  return (
    <div className="space-y-6">
      <div>
        <h1 className="text-3xl font-bold">Reading queue</h1>
        <p className="mt-1 max-w-3xl text-ink-600">
          Drops placed on a ready recording that still need your reading, the longest waiting first. Drops you have already read are not listed.
        </p>
      </div>
      <QueueTable />
    </div>
  );
}
