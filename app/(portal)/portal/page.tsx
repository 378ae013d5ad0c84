import { requirePageActor } from "@/lib/auth/page-guard";
import { ownOrganisation } from "@/lib/organisations/service";

export const metadata = { title: "Our submissions" };

export default async function PortalPage() {
  const actor = await requirePageActor(["manufacturer"]);
  const organisation = await ownOrganisation(actor);
  return (
    <div className="space-y-6">
      <div>
        <p className="text-sm font-semibold uppercase tracking-wide text-wick-700">{organisation?.name}</p>
        <h1 className="text-3xl font-bold">Our submissions</h1>
      </div>
      <section className="rounded-lg border border-ink-100 bg-white p-6">
        <h2 className="text-lg font-semibold">Nothing to show yet</h2>
        <p className="mt-2 text-ink-600">
          When the laboratory logs a submission from {organisation?.name ?? "your organisation"}, its status, results,
          requests for more samples and reports appear here. You only ever see your own organisation&apos;s records.
        </p>
      </section>
    </div>
  );
}
