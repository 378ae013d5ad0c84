import type { ClipView } from "@/lib/clips/view";

type Status = ClipView["status"];

export const CLIP_STATUS_LABELS: Record<Status, string> = {
  uploading: "Uploading",
  processing: "Processing",
  ready: "Ready",
  rejected: "Rejected",
  failed: "Processing failed",
};

const STYLE: Record<Status, string> = {
  uploading: "bg-wick-100 text-wick-700",
  processing: "bg-ink-100 text-ink-800",
  ready: "bg-ok-100 text-ok-700",
  rejected: "bg-bad-100 text-bad-700",
  failed: "bg-bad-100 text-bad-700",
};

export function ClipStatusBadge({ status }: { status: Status }) {
  return <span className={`whitespace-nowrap rounded-full px-2 py-0.5 text-xs font-semibold ${STYLE[status]}`}>{CLIP_STATUS_LABELS[status]}</span>;
}

/** Why a clip cannot be used, in words: the refusal, or the reason of the step that failed. */
export function clipProblem(c: Pick<ClipView, "status" | "rejectReason" | "steps">): string | null {
  if (c.status === "rejected") return c.rejectReason ?? "The file was refused.";
  if (c.status === "failed") return c.steps.find((s) => s.state === "failed")?.reason ?? "A processing step failed.";
  return null;
}
