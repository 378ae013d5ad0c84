import Link from "next/link";
import { LocalTime } from "@/components/ui/local-time";
import { Notice } from "@/components/ui/notice";
import { requirePageActor } from "@/lib/auth/page-guard";
import { lockedReason } from "@/lib/signoff/lock";
import { NewRunForm } from "./_components/new-run-form";
import { sampleContext } from "./_components/sample-context";

export const metadata = { title: "Record a run" };

export default async function NewRunPage({ params }: { params: Promise<{ id: string }> }) {
  const actor = await requirePageActor(["technician", "lead"]);
  const { sample, submission, limits } = await sampleContext(actor, (await params).id);
  const locked = await lockedReason(submission.id);
  return (
    <div className="space-y-6">
      <div>
        <Link href={`/submissions/${submission.id}`} className="text-sm font-semibold text-wick-700 underline">
          Back to submission {submission.reference}
        </Link>
        <h1 className="mt-2 text-3xl font-bold">Record a run</h1>
        <p className="mt-1 text-ink-600">
          Sample <strong>{sample.serial}</strong> of {submission.reference} · {submission.modelName}, round {sample.round}.
        </p>
        <p className="mt-1 text-sm text-ink-600">
          {sample.acclimationStartedAt ? (
            <>
              Acclimation started <LocalTime iso={sample.acclimationStartedAt.toISOString()} />;{" "}
            </>
          ) : (
            <>The acclimation start of this sample is not recorded; </>
          )}
          the edition asks for at least {limits.minAcclimationH} h in the test room before the test.
        </p>
      </div>
      {locked ? <Notice>{locked} No run can be recorded until then.</Notice> : <NewRunForm sampleId={sample.id} limits={limits} />}
    </div>
  );
}
