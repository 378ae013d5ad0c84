import type { DropView } from "@/lib/drops/hooks";

type Tone = "plain" | "waiting" | "good" | "bad";

const STYLE: Record<Tone, string> = {
  plain: "bg-ink-100 text-ink-800",
  waiting: "bg-wick-100 text-wick-700",
  good: "bg-ok-100 text-ok-700",
  bad: "bg-bad-100 text-bad-700",
};

const STATE_TONE: Record<NonNullable<DropView["state"]>, Tone> = {
  unread: "plain",
  "read once": "waiting",
  agreed: "good",
  discrepancy: "bad",
  ruled: "plain",
  "signed off": "good",
};

/**
 * What the viewer may know of a drop's progress. A blind reader is told only about their own
 * reading: the state would say whether someone else has read the drop.
 */
export function dropStateOf(d: Pick<DropView, "blind" | "state" | "clip" | "myDraft" | "mySubmitted">): { words: string; tone: Tone } {
  if (!d.blind) return { words: d.state ?? "unread", tone: STATE_TONE[d.state ?? "unread"] };
  if (!d.clip) return { words: "not ready to read", tone: "plain" };
  if (d.myDraft) return { words: d.myDraft.supersedesId ? "your correction in progress" : "your draft saved", tone: "waiting" };
  if (d.mySubmitted) return { words: "your reading submitted", tone: "good" };
  return { words: "waiting for your reading", tone: "waiting" };
}

export function DropStateBadge({ drop }: { drop: Parameters<typeof dropStateOf>[0] }) {
  const { words, tone } = dropStateOf(drop);
  return <span className={`whitespace-nowrap rounded-full px-2 py-0.5 text-xs font-semibold ${STYLE[tone]}`}>{words}</span>;
}
