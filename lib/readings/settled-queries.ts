import "server-only";
import type { Db } from "../db";
import { SETTLED_STATES } from "../drops/states";
import { CURRENT_SUBMITTED_G } from "./queries";

// The blind rule in SQL, once: every drop of a submission, with its current readings only once the
// drop is settled, so nothing of a drop still being read blind leaves the database. The results and
// the report both read drops through here.

export interface SettledReading {
  slot: number;
  reader: string;
  dispenseFrame: number;
  clearFrame: number;
  timeS: number;
  uncertaintyS: number | null;
}

export interface SubmissionDropRow {
  id: string;
  runId: string;
  ordinal: number;
  state: string;
  clipId: string | null;
  /** The time that counts (agreed or ruled), once settled. */
  agreedTimeS: number | null;
  /** The current submitted reading of each slot, in slot order; empty unless the drop is settled. */
  readings: SettledReading[];
}

export async function listSubmissionDrops(q: Db, submissionId: string): Promise<SubmissionDropRow[]> {
  const rows = await q.raw(
    `select d.id, d.run_id, d.ordinal, d.state, d.clip_id, d.agreed_time_s,
            coalesce(cur.readings, '[]'::json) as readings
       from drops d
       join runs r on r.id = d.run_id
       join samples x on x.id = r.sample_id
       left join lateral (
         select json_agg(json_build_object('slot', g.slot, 'reader', u.name, 'dispenseFrame', g.dispense_frame,
                         'clearFrame', g.clear_frame, 'timeS', g.time_s, 'uncertaintyS', g.uncertainty_expanded_s) order by g.slot) as readings
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
    clipId: r.clip_id,
    agreedTimeS: r.agreed_time_s,
    readings: r.readings,
  }));
}
