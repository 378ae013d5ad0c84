import "server-only";
import type { Db } from "../db";
import { listSubmissionDrops } from "../readings/settled-queries";

// The settled drops of a submission, with what a result needs from their readings.

export interface ResultDropRow {
  id: string;
  runId: string;
  ordinal: number;
  state: string;
  timeS: number | null;
  /** Largest expanded uncertainty of the drop's current readings. */
  uncertaintyS: number | null;
  readers: string[];
}

/**
 * Every drop of the submission's runs. Readers and uncertainties come only from drops already
 * settled (lib/readings/settled-queries.ts), so nothing about a drop still being read blind leaves here.
 */
export async function listResultDrops(q: Db, submissionId: string): Promise<ResultDropRow[]> {
  return (await listSubmissionDrops(q, submissionId)).map((d) => {
    const u = d.readings.map((r) => r.uncertaintyS).filter((v): v is number => v !== null);
    return {
      id: d.id,
      runId: d.runId,
      ordinal: d.ordinal,
      state: d.state,
      timeS: d.agreedTimeS,
      uncertaintyS: u.length ? Math.max(...u) : null,
      readers: d.readings.map((r) => r.reader),
    };
  });
}
