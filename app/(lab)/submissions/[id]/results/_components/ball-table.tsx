import Link from "next/link";
import { s1, s3, sJudged, type BallResultView, type ResultsView } from "@/lib/results/hooks";
import { BallStatus } from "./ball-status";

const th = "px-3 py-2 font-semibold";
const td = "px-3 py-2 align-top";

function DropTimes({ ball }: { ball: BallResultView }) {
  return (
    <ul className="space-y-0.5">
      {ball.drops.map((d) => (
        <li key={d.id} className="whitespace-nowrap tabular-nums">
          <Link href={`/drops/${d.id}`} className="text-wick-700 underline">
            Drop {d.ordinal}
          </Link>{" "}
          {d.settled ? (
            <>
              {s3(d.timeS)}
              {d.uncertaintyS !== null && <span className="text-ink-600"> ± {(d.uncertaintyS * 1000).toFixed(0)} ms</span>}
            </>
          ) : (
            <span className="text-ink-600">not settled</span>
          )}
          {d.outlier && (
            <strong className="ml-2 rounded bg-wick-100 px-1.5 text-xs text-wick-700" title="Dixon's Q flags this drop; it stays in the mean. The lab decides.">
              outlier?
            </strong>
          )}
        </li>
      ))}
      {ball.drops.length === 0 && <li className="text-ink-600">no run yet</li>}
    </ul>
  );
}

/** One row per ball: its drops, n, mean, SD, range, the value the criterion judges and where it sits. */
export function BallTable({ balls, edition }: Pick<ResultsView, "balls" | "edition">) {
  const judged = edition.criterion === "every_drop" ? "Shortest drop (judged)" : "Mean (judged)";
  return (
    <section aria-labelledby="balls-heading" className="space-y-3">
      <h2 id="balls-heading" className="text-xl font-semibold">
        Balls
      </h2>
      <div className="overflow-x-auto rounded-lg border border-ink-100 bg-white shadow-sm">
        <table className="w-full text-left text-sm">
          <caption className="sr-only">Each ball&apos;s drop times and result</caption>
          <thead className="bg-ink-50 text-ink-600">
            <tr>
              <th scope="col" className={th}>
                Ball
              </th>
              <th scope="col" className={th}>
                Round
              </th>
              <th scope="col" className={th}>
                Drop times (± U, k = 2)
              </th>
              <th scope="col" className={`${th} text-right`}>
                n
              </th>
              <th scope="col" className={`${th} text-right`}>
                {edition.criterion === "every_drop" ? "Mean" : judged}
              </th>
              <th scope="col" className={`${th} text-right`}>
                SD
              </th>
              <th scope="col" className={`${th} text-right`}>
                Range
              </th>
              {edition.criterion === "every_drop" && (
                <th scope="col" className={`${th} text-right`}>
                  {judged}
                </th>
              )}
              <th scope="col" className={th}>
                Result
              </th>
            </tr>
          </thead>
          <tbody>
            {balls.map((b) => (
              <tr key={b.sampleId} className="border-t border-ink-100" data-testid="ball-row">
                <th scope="row" className={`${td} font-semibold`}>
                  {b.serial}
                </th>
                <td className={td}>{b.round}</td>
                <td className={td}>
                  <DropTimes ball={b} />
                </td>
                <td className={`${td} text-right tabular-nums`}>{b.n || "—"}</td>
                <td className={`${td} text-right tabular-nums`}>{edition.criterion === "every_drop" ? s1(b.mean) : sJudged(b.mean, edition)}</td>
                <td className={`${td} text-right tabular-nums`}>{b.sd === null ? "—" : `${b.sd.toFixed(2)} s`}</td>
                <td className={`${td} text-right tabular-nums`}>{s1(b.range)}</td>
                {edition.criterion === "every_drop" && <td className={`${td} text-right tabular-nums`}>{sJudged(b.value, edition)}</td>}
                <td className={td}>
                  <BallStatus status={b.status} />
                  {b.pendingReason && <span className="mt-1 block text-xs text-ink-600">{b.pendingReason}</span>}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {balls.length === 0 && <p className="text-ink-600">No sample balls are recorded yet.</p>}
      <p className="text-xs text-ink-600">
        Dixon&apos;s Q at 95 % confidence flags an outlying drop on a ball; the drop stays in the results until the lab decides otherwise. U is the frame-timing
        uncertainty of the drop time (two marks, each within one frame).
      </p>
    </section>
  );
}
