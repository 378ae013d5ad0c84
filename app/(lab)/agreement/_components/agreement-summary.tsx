import type { ReactNode } from "react";
import { milliseconds } from "@/lib/clips/words";
import { Notice } from "@/components/ui/notice";
import type { AgreementReport } from "@/lib/agreement/hooks";
import { signed } from "@/lib/numbers";
import { signedMs } from "./numbers";

function Item({ term, children }: { term: string; children: ReactNode }) {
  return (
    <div className="rounded-lg border border-ink-100 bg-white p-4 shadow-sm">
      <dt className="text-sm font-semibold text-ink-600">{term}</dt>
      <dd className="mt-1 text-xl font-semibold tabular-nums text-ink-900">{children}</dd>
    </div>
  );
}

/** Pairs, bias ± sd, limits of agreement and the one-way ICC(1,1), each said plainly. */
export function AgreementSummary({ report }: { report: AgreementReport }) {
  const s = report.statistics;
  return (
    <section aria-labelledby="agreement-summary" className="space-y-3">
      <h2 id="agreement-summary" className="text-xl font-semibold">
        Summary, {report.from} to {report.to}
      </h2>
      <dl className="grid gap-3 sm:grid-cols-2 lg:grid-cols-4">
        <Item term="Drops read twice">{report.n}</Item>
        <Item term="Bias (first − second) ± sd">{s ? `${signedMs(s.biasS)} ± ${milliseconds(s.sdS)}` : "—"}</Item>
        <Item term={`Limits of agreement (bias ± ${s?.multiplier ?? 1.96} sd)`}>{s ? `${signedMs(s.lowerS)} to ${signedMs(s.upperS)}` : "—"}</Item>
        <Item term={`Intraclass correlation, ${s?.iccForm ?? "ICC(1,1)"} one-way`}>{s?.icc11 != null ? signed(s.icc11, 3) : "—"}</Item>
      </dl>
      {report.reason ? (
        <Notice>{report.reason}</Notice>
      ) : (
        <p className="max-w-3xl text-sm text-ink-600">
          About 95 % of differences between two readings of a drop are expected between the limits of agreement (Bland and Altman&apos;s method). The intraclass
          correlation is the one-way form ICC(1,1) of Shrout and Fleiss (case 1), because the first and second readings of different drops come from different
          reviewers: it is the share of the spread of single readings that comes from real differences between drops rather than from who read them. 1 means the
          two readings are interchangeable, near 0 (or below) that the readers disagree as much as the drops differ.
          {s?.iccReason && <> {s.iccReason}</>}
        </p>
      )}
    </section>
  );
}
