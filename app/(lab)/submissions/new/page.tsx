import Link from "next/link";
import { requirePageActor } from "@/lib/auth/page-guard";
import { SubmissionForm } from "./_components/submission-form";

export const metadata = { title: "New submission" };

export default async function NewSubmissionPage() {
  await requirePageActor(["technician", "lead"]);
  return (
    <div className="space-y-6">
      <div>
        <Link href="/submissions" className="text-sm font-semibold text-wick-700 underline">
          Back to submissions
        </Link>
        <h1 className="mt-2 text-3xl font-bold">New submission</h1>
        <p className="mt-1 text-ink-600">
          Log a ball model as it arrives. The specification edition in force on the received date is attached to it and cannot be swapped later.
        </p>
      </div>
      <SubmissionForm />
    </div>
  );
}
