import Link from "next/link";
import { requirePageActor } from "@/lib/auth/page-guard";
import { canEditIntake } from "@/lib/submissions/policy";
import { STAFF_ROLES } from "@/lib/users/rules";
import { SubmissionDetail } from "./_components/submission-detail";

export const metadata = { title: "Submission" };

export default async function SubmissionPage({ params }: { params: Promise<{ id: string }> }) {
  const actor = await requirePageActor(STAFF_ROLES);
  const { id } = await params;
  return (
    <div className="space-y-6">
      <p>
        <Link href="/submissions" className="text-sm font-semibold text-wick-700 underline">
          Back to submissions
        </Link>
      </p>
      <SubmissionDetail id={id} canEdit={canEditIntake(actor)} />
    </div>
  );
}
