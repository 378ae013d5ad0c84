import type { BallResultView } from "@/lib/results/hooks";
import type { Decision } from "@/lib/results/decision";

// Words first, colour second: every badge says what it means.
const BALL: Record<BallResultView["status"], { words: string; style: string }> = {
  meets: { words: "clear of the guard band", style: "bg-ok-100 text-ok-700" },
  close: { words: "close to the limit", style: "bg-wick-100 text-wick-700" },
  below: { words: "below the minimum", style: "bg-bad-100 text-bad-700" },
  pending: { words: "waiting", style: "bg-ink-100 text-ink-800" },
};

export function BallStatus({ status }: { status: BallResultView["status"] }) {
  const b = BALL[status];
  return <span className={`whitespace-nowrap rounded-full px-2 py-0.5 text-xs font-semibold ${b.style}`}>{b.words}</span>;
}

const DECISION_STYLE: Record<Decision, string> = {
  "meets limit": "border-ok-700 bg-ok-100 text-ok-700",
  "close to limit — more samples": "border-wick-600 bg-wick-100 text-wick-700",
  "below limit": "border-bad-700 bg-bad-100 text-bad-700",
  pending: "border-ink-200 bg-ink-50 text-ink-800",
};

export function DecisionBadge({ decision }: { decision: Decision }) {
  return (
    <span className={`inline-block rounded-md border-2 px-3 py-1 text-lg font-bold ${DECISION_STYLE[decision]}`}>
      {decision[0].toUpperCase() + decision.slice(1)}
    </span>
  );
}
