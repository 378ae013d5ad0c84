import Link from "next/link";
import { requirePageActor } from "@/lib/auth/page-guard";
import { hasRole, STAFF_ROLES } from "@/lib/users/rules";
import { ResultsPanel } from "./_components/results-panel";
import { SignoffPanel } from "./_components/signoff-panel";

export const metadata = { title: "Results" };

export default async function SubmissionResultsPage({ params }: { params: Promise<{ id: string }> }) {
  const actor = await requirePageActor(STAFF_ROLES);
  const { id } = await params;
  return (
    <div className="space-y-6">
      <p>
        <Link href={`/submissions/${id}`} className="text-sm font-semibold text-wick-700 underline">
          Back to the submission
        </Link>
      </p>
      <ResultsPanel id={id} signOff={hasRole(actor, "lead") ? <SignoffPanel submissionId={id} /> : undefined} />
    </div>
  );
}
