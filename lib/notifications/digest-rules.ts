// The reviewers' daily digest: when it runs, which day it belongs to, and what it says. Pure.
//
// Blind rule: a digest names how many drops wait for the reviewer and in which submissions, never
// a drop's state or anything of another reader's work (not even that a first reading exists).

/** The calendar day (UTC) a digest belongs to: one digest per reviewer per day. */
export function digestDay(now: Date): string {
  return now.toISOString().slice(0, 10);
}

/** "HH:MM" (UTC) as the daily cron expression pg-boss schedules. */
export function digestCron(at: string): string {
  const m = /^([01]\d|2[0-3]):([0-5]\d)$/.exec(at);
  if (!m) throw new Error(`A digest time is HH:MM in UTC, for example 07:00; got "${at}".`);
  return `${Number(m[2])} ${Number(m[1])} * * *`;
}

export interface WaitingDrop {
  submissionId: string;
  submissionReference: string;
  placedAt: Date | null;
}

export interface DigestSummary {
  waiting: number;
  /** Submissions in order of their oldest waiting drop. */
  submissions: { submissionId: string; reference: string; count: number }[];
  oldest: Date | null;
}

/** Counts the drops waiting for one reviewer, per submission; null when nothing waits. */
export function summariseWaiting(drops: readonly WaitingDrop[]): DigestSummary | null {
  if (drops.length === 0) return null;
  const by = new Map<string, { submissionId: string; reference: string; count: number; first: number }>();
  let oldest: Date | null = null;
  for (const d of drops) {
    const at = d.placedAt?.getTime() ?? Number.POSITIVE_INFINITY;
    const s = by.get(d.submissionId) ?? { submissionId: d.submissionId, reference: d.submissionReference, count: 0, first: at };
    s.count += 1;
    s.first = Math.min(s.first, at);
    by.set(d.submissionId, s);
    if (d.placedAt && (!oldest || d.placedAt < oldest)) oldest = d.placedAt;
  }
  const submissions = [...by.values()]
    .sort((a, b) => a.first - b.first || a.reference.localeCompare(b.reference, "en", { numeric: true }))
    .map(({ first: _f, ...s }) => s);
  return { waiting: drops.length, submissions, oldest };
}
