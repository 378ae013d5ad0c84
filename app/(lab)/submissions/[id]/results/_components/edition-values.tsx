import Link from "next/link";
import type { ResultsView } from "@/lib/results/hooks";
import { BELOW_MINIMUM_RULE_LABELS, CRITERION_LABELS } from "@/lib/editions/schema";

/** The edition's values these results were judged by, each with where it comes from. */
export function EditionValues({ edition: e }: Pick<ResultsView, "edition">) {
  const rows: [string, string, keyof typeof e.sources | string][] = [
    ["Minimum absorption time", `${e.minAbsorptionS} s`, "minAbsorptionS"],
    ["Criterion", CRITERION_LABELS[e.criterion], "criterion"],
    ["A ball below the minimum", BELOW_MINIMUM_RULE_LABELS[e.belowMinimumRule], "belowMinimumRule"],
    ["Guard band", `${e.guardBandS} s above the minimum`, "guardBandS"],
    ["Rounds", e.roundSizes.join(", then "), "roundSizes"],
    ["Tolerance coverage and confidence", `${e.toleranceCoverage * 100} % / ${e.toleranceConfidence * 100} %`, "toleranceCoverage"],
  ];
  return (
    <section aria-labelledby="edition-heading" className="space-y-2">
      <h2 id="edition-heading" className="text-xl font-semibold">
        Judged against{" "}
        <Link href={`/editions/${e.id}`} className="text-wick-700 underline">
          {e.name}
        </Link>
      </h2>
      <table className="w-full max-w-4xl text-left text-sm">
        <caption className="sr-only">The values of the specification edition</caption>
        <tbody>
          {rows.map(([label, value, key]) => (
            <tr key={label} className="border-t border-ink-100">
              <th scope="row" className="w-64 py-1.5 pr-4 font-semibold">
                {label}
              </th>
              <td className="py-1.5 pr-4 tabular-nums">{value}</td>
              <td className="py-1.5 text-ink-600">{e.sources[key] ?? "no source given"}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </section>
  );
}
