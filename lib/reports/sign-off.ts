import type { Db } from "../db";

// The report's sign-off part: rulings with reasons, the signature and its revision, and what
// changed since the previous revision. The rulings and signatures tables arrive with the
// sign-off work; `signOffPart` is the one place their rows plug into the report.

export interface ReportRuling {
  dropId: string;
  serial: string;
  dropOrdinal: number;
  lead: string;
  at: string;
  /** "first reading", "second reading" or "third reading". */
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

export interface SignOffPart {
  rulings: ReportRuling[];
  signature: ReportSignature | null;
  /** What changed since the previous revision, one line each; null for the first revision. */
  changes: { reopenReason: string; lines: string[] } | null;
}

/** Nothing is signed on a submission until the sign-off tables exist: a draft report without rulings. */
export async function signOffPart(_q: Db, _submissionId: string): Promise<SignOffPart> {
  return { rulings: [], signature: null, changes: null };
}
