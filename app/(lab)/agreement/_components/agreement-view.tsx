"use client";

import { usePathname, useRouter } from "next/navigation";
import { Notice } from "@/components/ui/notice";
import { useAgreement } from "@/lib/agreement/hooks";
import { apiError } from "@/components/ui/form-errors";
import { AgreementSummary } from "./agreement-summary";
import { BlandAltmanChart } from "./bland-altman-chart";
import { LargestTable } from "./largest-table";
import { RangeForm } from "./range-form";
import { ReviewerBiasTable } from "./reviewer-bias-table";

/** The period lives in the address, so a reload or a shared link shows the same drops. */
export function AgreementView({ from, to }: { from?: string; to?: string }) {
  const router = useRouter();
  const pathname = usePathname();
  const q = useAgreement({ from, to });
  const err = apiError(q.error);
  const report = q.isError ? undefined : q.data;
  const change = (r: { from: string; to: string }) => router.replace(`${pathname}?${new URLSearchParams(r)}`, { scroll: false });
  return (
    <div className="space-y-6">
      <RangeForm from={report?.from ?? from ?? ""} to={report?.to ?? to ?? ""} errors={err?.fields ?? {}} busy={q.isFetching} onChange={change} />
      {q.isPending && (
        <p className="text-ink-600" role="status">
          Computing the agreement…
        </p>
      )}
      {q.isError && <Notice tone="error">{q.error.message}</Notice>}
      {report && (
        <>
          {report.truncatedAt !== null && (
            <Notice tone="warn">
              This period holds more than {report.truncatedAt} drops read twice; only the most recently settled {report.truncatedAt} are counted. Choose a
              shorter period.
            </Notice>
          )}
          <AgreementSummary report={report} />
          {report.n > 0 && <BlandAltmanChart report={report} />}
          <ReviewerBiasTable reviewers={report.reviewers} />
          <LargestTable largest={report.largest} />
        </>
      )}
    </div>
  );
}
