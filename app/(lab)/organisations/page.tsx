import { requirePageActor } from "@/lib/auth/page-guard";
import { AddOrganisationForm } from "./_components/add-organisation-form";
import { OrganisationsTable } from "./_components/organisations-table";

export const metadata = { title: "Organisations" };

export default async function OrganisationsPage() {
  await requirePageActor(["lead"]);
  return (
    <div className="space-y-8">
      <div>
        <h1 className="text-3xl font-bold">Organisations</h1>
        <p className="mt-1 text-ink-600">The manufacturers that send submissions, and the addresses that receive their notices.</p>
      </div>
      <AddOrganisationForm />
      <OrganisationsTable />
    </div>
  );
}
