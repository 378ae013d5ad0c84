import { KIND_LABELS, STATUS_LABELS, type SubmissionStatus } from "@/lib/submissions/schema";

export { KIND_LABELS };

const STATUS_STYLE: Record<SubmissionStatus, string> = {
  received: "bg-ink-100 text-ink-800",
  testing: "bg-wick-100 text-wick-700",
  awaiting_samples: "bg-wick-100 text-wick-700",
  decided: "bg-ok-100 text-ok-700",
  released: "bg-ok-100 text-ok-700",
};

export function StatusBadge({ status }: { status: SubmissionStatus }) {
  return <span className={`whitespace-nowrap rounded-full px-2 py-0.5 text-xs font-semibold ${STATUS_STYLE[status]}`}>{STATUS_LABELS[status]}</span>;
}
