import { s1, type ResultsView } from "@/lib/results/hooks";
import { DetailList } from "@/components/ui/detail-list";
import { Notice } from "@/components/ui/notice";
import { pct, secsAgainst } from "@/lib/results/words";
import { DecisionBadge } from "./ball-status";

/** The decision, why, what comes next, and the tolerance figures behind it. */
export function DecisionPanel({ decision: d, edition, released = false }: Pick<ResultsView, "decision" | "edition"> & { released?: boolean }) {
  const t = d.tolerance;
  return (
    <section aria-labelledby="decision-heading" className="space-y-4 rounded-lg border border-ink-100 bg-white p-5 shadow-sm">
      <div className="flex flex-wrap items-baseline gap-3">
        <h2 id="decision-heading" className="text-xl font-semibold">
          Decision after round {d.round}
        </h2>
        <DecisionBadge decision={d.decision} />
      </div>
      <p className="max-w-4xl text-ink-900" data-testid="decision-explanation">
        {d.explanation}
      </p>
      {/* Once signed off nothing is left to do unless a lead re-opens the results. */}
      <p className="text-sm">
        <strong>Next:</strong> {released ? "Nothing: the results are signed off and released. A lead can re-open them, with a reason." : d.nextAction}
      </p>
      {d.belowBalls.length > 0 && (
        <Notice tone="error">
          <strong>Below the {edition.minAbsorptionS} s minimum:</strong> {d.belowNote}
        </Notice>
      )}
      {t && (
        <div className="space-y-2 border-t border-ink-100 pt-4">
          <h3 className="font-semibold">
            Lower tolerance limit {t.passes ? "at or above" : "below"} the minimum{" "}
            <span className="font-normal text-ink-600">({d.finalRound ? "decides once every round is in" : "for information until the last round is in"})</span>
          </h3>
          <DetailList
            items={[
              { label: "Balls", value: t.n },
              { label: "Mean of ball values", value: s1(t.mean) },
              { label: "Standard deviation", value: `${t.sd.toFixed(2)} s` },
              { label: `k (${pct(t.coverage)} coverage, ${pct(t.confidence)} confidence)`, value: t.k.toFixed(3) },
              { label: "Lower tolerance limit", value: secsAgainst(t.limit, edition.minAbsorptionS, 2) },
              { label: "Estimated fraction below the minimum", value: pct(t.fractionBelow, 2) },
              { label: "Cpl", value: t.cpl === null ? "—" : t.cpl.toFixed(2) },
            ]}
          />
          <p className="text-xs text-ink-600">
            Limit = mean − k·s, with k exact from the noncentral t distribution; the fraction below is Φ((minimum − mean)/s) and assumes normally distributed
            ball values.
          </p>
        </div>
      )}
    </section>
  );
}
