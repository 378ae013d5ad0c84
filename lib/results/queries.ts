import { SETTLED_STATES } from "../drops/states";
import type { Db } from "../db";
import { CURRENT_SUBMITTED_G } from "../readings/queries";

// The settled drops of a submission, with what a result needs from their readings.

/** Drop states whose time counts in a result. */

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
 * settled, so nothing about a drop still being read blind leaves this query.
 */
export async function listResultDrops(q: Db, submissionId: string): Promise<ResultDropRow[]> {
  const rows = await q.raw(
    `select d.id, d.run_id, d.ordinal, d.state, d.agreed_time_s,
            cur.uncertainty_s, coalesce(cur.readers, '{}') as readers
       from drops d
       join runs r on r.id = d.run_id
       join samples x on x.id = r.sample_id
       left join lateral (
         select max(g.uncertainty_expanded_s) as uncertainty_s, array_agg(u.name order by g.slot) as readers
           from readings g join users u on u.id = g.reviewer_id
          where g.drop_id = d.id and ${CURRENT_SUBMITTED_G}
       ) cur on d.state = any(?)
      where x.submission_id = ?
      order by d.run_id, d.ordinal`,
    [[...SETTLED_STATES], submissionId],
  );
  return rows.rows.map((r: Record<string, any>) => ({
    id: r.id,
    runId: r.run_id,
    ordinal: r.ordinal,
    state: r.state,
    timeS: r.agreed_time_s,
    uncertaintyS: r.uncertainty_s,
    readers: r.readers ?? [],
  }));
}
