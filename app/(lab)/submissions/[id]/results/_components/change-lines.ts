import type { ResultChanges } from "@/lib/signoff/rules";

const seconds = (v: number | null, digits: number) => (v === null ? "no value" : `${v.toFixed(digits)} s`);

/** Ball means to one decimal, as reported; to three when one decimal would hide the change. */
function meanChange(m: { before: number | null; after: number | null }): string {
  const digits = m.before !== null && m.after !== null && m.before.toFixed(1) === m.after.toFixed(1) ? 3 : 1;
  return `mean ${seconds(m.before, digits)} → ${seconds(m.after, digits)}`;
}

/** What changed in the results since the revision signed before this one, in words. */
export function changeLines(c: ResultChanges | null): string[] {
  if (!c) return [];
  const lines = [
    ...(c.decision ? [`Decision: ${c.decision.before} → ${c.decision.after}`] : []),
    ...(c.ballsAdded.length ? [`Balls added: ${c.ballsAdded.join(", ")}`] : []),
    ...(c.ballsRemoved.length ? [`Balls removed: ${c.ballsRemoved.join(", ")}`] : []),
    ...c.balls.map(
      (b) => `Ball ${b.serial}: ${[b.mean && meanChange(b.mean), b.status && `status ${b.status.before} → ${b.status.after}`].filter(Boolean).join(", ")}`,
    ),
  ];
  return lines.length ? lines : ["No change in the ball results or the decision."];
}
