import { Suspense } from "react";
import { requirePageActor } from "@/lib/auth/page-guard";
import { ownOrganisation } from "@/lib/organisations/service";
import { SubmissionList } from "@/components/submissions/submission-list";

export const metadata = { title: "Our submissions" };

export default async function PortalPage() {
  const actor = await requirePageActor(["manufacturer"]);
  const organisation = await ownOrganisation(actor);
  return (
    <div className="space-y-6">
      <div>
        <p className="text-sm font-semibold uppercase tracking-wide text-wick-700">{organisation?.name}</p>
        <h1 className="text-3xl font-bold">Our submissions</h1>
        <p className="mt-1 text-ink-600">
          Each ball model the laboratory has received from {organisation?.name ?? "your organisation"}, with its status and current round. You only ever see
          your own organisation&apos;s records.
        </p>
      </div>
      <Suspense fallback={<p className="text-ink-600">Loading submissions…</p>}>
        <SubmissionList
          caption={`Submissions of ${organisation?.name ?? "your organisation"}`}
          basePath="/portal/submissions"
          withOrganisation={false}
          emptyText="Nothing to show yet. When the laboratory logs a submission from you, it appears here."
        />
      </Suspense>
    </div>
  );
}
