import Link from "next/link";
import { s1, type ResultsView } from "@/lib/results/hooks";
import { DetailList } from "@/components/ui/detail-list";
import { signed } from "@/lib/numbers";
import { DecisionBadge } from "./ball-status";

type Comparison = NonNullable<ResultsView["surveillance"]>;

const summary = (s: Comparison["market"]["summary"]) =>
  s ? `${s.n} ball${s.n === 1 ? "" : "s"}, mean ${s1(s.mean)}${s.n > 1 ? `, SD ${s.sd.toFixed(2)} s` : ""}` : "no results yet";

/** Market samples against the approval results of the same model. */
export function SurveillancePanel({ comparison: c }: { comparison: Comparison }) {
  const verdict = c.stillMeets === null ? "not judged yet" : c.stillMeets ? "still meet the limit" : "no longer meet the limit";
  return (
    <section aria-labelledby="surveillance-heading" className="space-y-3 rounded-lg border border-ink-100 bg-white p-5 shadow-sm">
      <h2 id="surveillance-heading" className="text-xl font-semibold">
        Against the approval
      </h2>
      <p className="text-ink-900">
        Market samples <strong>{verdict}</strong>. {c.explanation}
      </p>
      <DetailList
        items={[
          {
            label: "Approval",
            value: (
              <Link href={`/submissions/${c.approval.submissionId}/results`} className="font-semibold text-wick-700 underline">
                {c.approval.reference}
              </Link>
            ),
          },
          { label: "Approval decision", value: <DecisionBadge decision={c.approval.decision} /> },
          { label: "Approval balls", value: summary(c.approval.summary) },
          { label: "Market balls", value: summary(c.market.summary) },
          {
            label: "Difference, market − approval",
            value: c.difference
              ? `${signed(c.difference.value, 2)} s (${Math.round(c.difference.confidence * 100)} % Welch interval ${signed(c.difference.lower, 2)} to ${signed(c.difference.upper, 2)} s, ${c.difference.df.toFixed(1)} df)`
              : "needs 2 balls on each side",
          },
        ]}
      />
    </section>
  );
}
