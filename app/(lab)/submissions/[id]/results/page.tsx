import Link from "next/link";
import { requirePageActor } from "@/lib/auth/page-guard";
import { STAFF_ROLES } from "@/lib/users/rules";
import { ResultsPanel } from "./_components/results-panel";

export const metadata = { title: "Results" };

export default async function SubmissionResultsPage({ params }: { params: Promise<{ id: string }> }) {
  await requirePageActor(STAFF_ROLES);
  const { id } = await params;
  return (
    <div className="space-y-6">
      <p>
        <Link href={`/submissions/${id}`} className="text-sm font-semibold text-wick-700 underline">Back to the submission</Link>
      </p>
      <ResultsPanel id={id} />
    </div>
  );
}
