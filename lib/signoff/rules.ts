// The lock a signature puts on a submission, and what changed between two signed revisions. Pure.

export interface LockState {
  reference: string;
  /** Signed revisions and re-openings so far. */
  signedRevisions: number[];
  reopenedRevisions: number[];
}

/** The revision in force: 1, or the latest re-opening's. */
export function currentRevision(s: Pick<LockState, "reopenedRevisions">): number {
  return Math.max(1, ...s.reopenedRevisions);
}

/** Locked when the revision in force is signed; null when changes may be made. */
export function lockReason(s: LockState): string | null {
  const rev = currentRevision(s);
  if (!s.signedRevisions.includes(rev)) return null;
  return `Submission ${s.reference} is signed off (revision ${rev}). A lead must re-open it first.`;
}

/**
 * Why results cannot be signed yet, from the staged decision; null when they can. Only a final
 * decision (meets or below the limit) is signed: a pending one has nothing to sign, and one that
 * asks for more samples would lock out the very round it asks for.
 */
export function signRefusal(r: { ballCount: number; decision: string; explanation: string; nextAction: string }): string | null {
  if (r.ballCount === 0) return "This submission has no ball results yet, so there is nothing to sign off.";
  if (r.decision === "pending") return `The decision is still pending. ${r.explanation} Results can be signed off once it is made.`;
  if (r.decision === "close to limit — more samples")
    return `The decision asks for more samples: ${r.nextAction} Results can be signed off once the last round gives a final decision.`;
  return null;
}

export interface SnapshotBall {
  sampleId: string;
  serial: string;
  mean: number | null;
  status: string;
}

export interface Snapshot {
  balls: SnapshotBall[];
  decision: { decision: string };
}

export interface ResultChanges {
  balls: { serial: string; mean: { before: number | null; after: number | null } | null; status: { before: string; after: string } | null }[];
  ballsAdded: string[];
  ballsRemoved: string[];
  decision: { before: string; after: string } | null;
}

/** What changed in the results between the previous signed snapshot and this one. */
export function diffResults(before: Snapshot, after: Snapshot): ResultChanges {
  const old = new Map(before.balls.map((b) => [b.sampleId, b]));
  const now = new Map(after.balls.map((b) => [b.sampleId, b]));
  const balls: ResultChanges["balls"] = [];
  for (const b of after.balls) {
    const o = old.get(b.sampleId);
    if (!o) continue;
    const mean = o.mean === b.mean ? null : { before: o.mean, after: b.mean };
    const status = o.status === b.status ? null : { before: o.status, after: b.status };
    if (mean || status) balls.push({ serial: b.serial, mean, status });
  }
  return {
    balls,
    ballsAdded: after.balls.filter((b) => !old.has(b.sampleId)).map((b) => b.serial),
    ballsRemoved: before.balls.filter((b) => !now.has(b.sampleId)).map((b) => b.serial),
    decision: before.decision.decision === after.decision.decision ? null : { before: before.decision.decision, after: after.decision.decision },
  };
}
