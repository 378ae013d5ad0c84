import { ButtonLink } from "@/components/ui/button";
import { requirePageActor } from "@/lib/auth/page-guard";
import { hasRole, STAFF_ROLES } from "@/lib/users/rules";
import { EditionCaution } from "./_components/edition-caution";
import { EditionsTable } from "./_components/editions-table";

export const metadata = { title: "Specification editions" };

export default async function EditionsPage() {
  const actor = await requirePageActor(STAFF_ROLES);
  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <h1 className="text-3xl font-bold">Specification editions</h1>
          <p className="mt-1 max-w-3xl text-ink-600">
            Each submission is judged against the edition in force on the day it was received. Once a submission uses an edition, the edition cannot change; a
            new edition is made instead.
          </p>
        </div>
        {hasRole(actor, "lead") && <ButtonLink href="/editions/new">New edition</ButtonLink>}
      </div>
      <EditionCaution />
      <EditionsTable />
    </div>
  );
}
