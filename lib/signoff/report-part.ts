import "server-only";
import type { Db } from "../db";
import { listRulingsOfSubmission } from "../rulings/queries";
import { listReopenings, listSignatures, type SignatureRow } from "./queries";
import { currentRevision, type ResultChanges } from "./rules";
import { fixed } from "../reports/format";

// The report's sign-off part: rulings with reasons, the signature of the revision in force, the
// revision history, and what changed since the previous revision. Read from the rulings,
// signatures and reopenings tables through their own queries.

export interface ReportRuling {
  dropId: string;
  serial: string;
  dropOrdinal: number;
  lead: string;
  at: string;
  /** "first reading (name)", "second reading (name)" or "third reading (name)". */
  accepted: string;
  timeS: number;
  reason: string;
}

export interface ReportSignature {
  by: string;
  at: string;
  meaning: string;
  revision: number;
}

export interface ReportRevision {
  revision: number;
  reopened: { at: string; reason: string } | null;
  signature: ReportSignature | null;
}

export interface SignOffPart {
  /** The revision in force: 1, or the latest re-opening's. */
  revision: number;
  rulings: ReportRuling[];
  /** The signature of the revision in force; null while it is a draft. */
  signature: ReportSignature | null;
  /** Every revision so far, oldest first. */
  history: ReportRevision[];
  /** Why the revision in force was re-opened and what changed in it, one line each; null for revision 1. */
  changes: { reopenReason: string; lines: string[] } | null;
}

const mean = (v: number | null) => (v === null ? "none" : `${fixed(v, 3)} s`);

/** The stored difference between two signed snapshots, as sentences (words, not arrows: the embedded font has no arrow glyph). */
export function changeLines(c: ResultChanges): string[] {
  const lines: string[] = [];
  if (c.decision) lines.push(`Decision: from ${c.decision.before} to ${c.decision.after}.`);
  for (const b of c.balls) {
    const parts = [
      b.mean && `mean from ${mean(b.mean.before)} to ${mean(b.mean.after)}`,
      b.status && `status from ${b.status.before} to ${b.status.after}`,
    ].filter(Boolean);
    lines.push(`${b.serial}: ${parts.join("; ")}.`);
  }
  if (c.ballsAdded.length) lines.push(`Balls added: ${c.ballsAdded.join(", ")}.`);
  if (c.ballsRemoved.length) lines.push(`Balls removed: ${c.ballsRemoved.join(", ")}.`);
  return lines.length ? lines : ["No ball result and no decision changed."];
}

const toSignature = (g: SignatureRow): ReportSignature => ({ by: g.signedByName, at: g.signedAt.toISOString(), meaning: g.meaning, revision: g.revision });

export async function signOffPart(q: Db, submissionId: string): Promise<SignOffPart> {
  const [rulings, signed, reopened] = await Promise.all([
    listRulingsOfSubmission(q, submissionId),
    listSignatures(q, submissionId),
    listReopenings(q, submissionId),
  ]);
  const revision = currentRevision({ reopenedRevisions: reopened.map((r) => r.revision) });
  const current = signed.find((g) => g.revision === revision);
  const reopening = reopened.find((r) => r.revision === revision);
  const history = Array.from({ length: revision }, (_, i) => {
    const g = signed.find((x) => x.revision === i + 1);
    const r = reopened.find((x) => x.revision === i + 1);
    return { revision: i + 1, reopened: r ? { at: r.reopenedAt.toISOString(), reason: r.reason } : null, signature: g ? toSignature(g) : null };
  });
  return {
    revision,
    rulings: rulings.map((x) => ({
      dropId: x.dropId,
      serial: x.serial,
      dropOrdinal: x.dropOrdinal,
      lead: x.ruledByName,
      at: x.ruledAt.toISOString(),
      accepted: `${x.chosen} reading (${x.acceptedReader})`,
      timeS: x.timeS,
      reason: x.reason,
    })),
    signature: current ? toSignature(current) : null,
    history,
    changes: reopening
      ? {
          reopenReason: reopening.reason,
          lines: current?.changes
            ? changeLines(current.changes as ResultChanges)
            : ["The changes in the results are recorded when a lead signs this revision off."],
        }
      : null,
  };
}
