import Link from "next/link";
import { requirePageActor } from "@/lib/auth/page-guard";
import { PortalSubmission } from "./_components/portal-submission";

export const metadata = { title: "Submission" };

export default async function PortalSubmissionPage({ params }: { params: Promise<{ id: string }> }) {
  await requirePageActor(["manufacturer"]);
  const { id } = await params;
  return (
    <div className="space-y-6">
      <p>
        <Link href="/portal" className="text-sm font-semibold text-wick-700 underline">
          Back to our submissions
        </Link>
      </p>
      <PortalSubmission id={id} />
      <p className="text-sm text-ink-600">You only ever see your own organisation&apos;s records.</p>
    </div>
  );
}
