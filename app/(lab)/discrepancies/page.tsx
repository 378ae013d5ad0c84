import { requirePageActor } from "@/lib/auth/page-guard";
import { DiscrepancyTable } from "./_components/discrepancy-table";

export const metadata = { title: "Discrepancies" };

export default async function DiscrepanciesPage() {
  await requirePageActor(["lead"]);
  return (
    <div className="space-y-6">
      <div>
        <h1 className="text-3xl font-bold">Discrepancies</h1>
        <p className="mt-1 max-w-3xl text-ink-600">
          Drops whose two readings differ by more than the edition&apos;s tolerance, in the drop time or in either mark, the oldest first.
        </p>
      </div>
      <DiscrepancyTable />
    </div>
  );
}
