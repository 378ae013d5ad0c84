import type { DropState } from "@/lib/readings/rules";

const LABELS: Record<DropState, string> = {
  unread: "Unread",
  "read once": "Read once",
  agreed: "Agreed",
  discrepancy: "Discrepancy",
  ruled: "Ruled",
  "signed off": "Signed off",
};

const STYLE: Record<DropState, string> = {
  unread: "bg-ink-100 text-ink-800",
  "read once": "bg-wick-100 text-wick-700",
  agreed: "bg-ok-100 text-ok-700",
  discrepancy: "bg-bad-100 text-bad-700",
  ruled: "bg-ok-100 text-ok-700",
  "signed off": "bg-ink-800 text-white",
};

export function DropStateBadge({ state }: { state: DropState }) {
  return <span className={`whitespace-nowrap rounded-full px-2 py-0.5 text-xs font-semibold ${STYLE[state]}`}>{LABELS[state]}</span>;
}
