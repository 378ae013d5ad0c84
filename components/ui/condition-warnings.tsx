import type { RunView } from "@/lib/runs/view";
import { formatInstant } from "./dates";

type Conditions = Pick<RunView, "flags" | "needsAcceptance" | "acceptedByName" | "acceptedAt" | "acceptReason">;

/** A run's condition flags in words, and whether a lead has accepted them. */
export function ConditionWarnings({ run, showWhen = false }: { run: Conditions; showWhen?: boolean }) {
  if (run.flags.length === 0) return <p className="text-sm text-ok-700">Conditions within the edition&apos;s limits.</p>;
  const accepted = !run.needsAcceptance && run.acceptedByName;
  return (
    <div
      className={`rounded-md border-l-4 px-3 py-2 text-sm ${accepted ? "border-ink-400 bg-ink-50 text-ink-800" : "border-wick-600 bg-wick-100 text-ink-900"}`}
    >
      <p className="font-semibold">{accepted ? "Conditions warning, accepted" : "Conditions warning"}</p>
      <ul className="mt-1 list-disc space-y-0.5 pl-5">
        {run.flags.map((f) => (
          <li key={f.code}>{f.message}</li>
        ))}
      </ul>
      {accepted && (
        <p className="mt-1">
          Accepted by {run.acceptedByName}
          {showWhen && run.acceptedAt ? ` on ${formatInstant(run.acceptedAt)}` : ""}: {run.acceptReason}
        </p>
      )}
    </div>
  );
}
