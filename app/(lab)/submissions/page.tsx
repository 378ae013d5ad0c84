import { Suspense } from "react";
import { ButtonLink } from "@/components/ui/button";
import { requirePageActor } from "@/lib/auth/page-guard";
import { canEditIntake } from "@/lib/submissions/policy";
import { STAFF_ROLES } from "@/lib/users/rules";
import { SubmissionList } from "@/components/submissions/submission-list";
import { SubmissionFilters } from "./_components/submission-filters";

export const metadata = { title: "Submissions" };

export default async function SubmissionsPage() {
  const actor = await requirePageActor(STAFF_ROLES);
  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <h1 className="text-3xl font-bold">Submissions</h1>
          <p className="mt-1 text-ink-600">Every ball model received for approval, surveillance or research.</p>
        </div>
        {canEditIntake(actor) && <ButtonLink href="/submissions/new">New submission</ButtonLink>}
      </div>
      {/* The list reads its filters from the address, which needs a boundary while the page streams. */}
      <Suspense fallback={<p className="text-ink-600">Loading submissions…</p>}>
        <SubmissionFilters />
        <SubmissionList caption="Submissions, with the current filters, order and page" basePath="/submissions" />
      </Suspense>
    </div>
  );
}
