import "server-only";
import type { Db } from "../db";
import { CURRENT_SUBMITTED_G } from "../readings/queries";
import type { ReadingPair } from "./rules";

/** At most this many pairs are read for one period, the most recently settled. */
export const PAIR_LIMIT = 10_000;

// The current reading of a slot is the last submitted one of its chain: a submitted reading that
// no submitted correction replaces (the same rule as lib/readings/rules.ts currentReadings).
const CURRENT = `
  select g.drop_id, g.slot, g.reviewer_id, u.name as reviewer_name, g.time_s, g.submitted_at
  from readings g
  join users u on u.id = g.reviewer_id
  where ${CURRENT_SUBMITTED_G}
`;

/**
 * Drops whose two current readings are both submitted, the later submission in [start, end).
 * Only complete pairs: nothing is said about a drop still being read blind.
 */
export async function listReadingPairs(q: Db, range: { start: Date; end: Date }, limit = PAIR_LIMIT): Promise<{ pairs: ReadingPair[]; truncated: boolean }> {
  const { rows } = await q.raw(
    `with cur as (${CURRENT})
     select d.id as drop_id, d.ordinal, d.agreed_time_s, s.serial as sample_serial, sub.reference as submission_reference,
            a.reviewer_id as a_id, a.reviewer_name as a_name, a.time_s as a_time,
            b.reviewer_id as b_id, b.reviewer_name as b_name, b.time_s as b_time,
            greatest(a.submitted_at, b.submitted_at) as settled_at
     from drops d
     join cur a on a.drop_id = d.id and a.slot = 1
     join cur b on b.drop_id = d.id and b.slot = 2
     join runs r on r.id = d.run_id
     join samples s on s.id = r.sample_id
     join submissions sub on sub.id = s.submission_id
     where greatest(a.submitted_at, b.submitted_at) >= ? and greatest(a.submitted_at, b.submitted_at) < ?
     order by settled_at desc, d.id
     limit ?`,
    [range.start, range.end, limit + 1],
  );
  const pairs = (rows as Record<string, any>[]).slice(0, limit).map(
    (r): ReadingPair => ({
      dropId: r.drop_id,
      submissionReference: r.submission_reference,
      sampleSerial: r.sample_serial,
      ordinal: r.ordinal,
      first: { reviewerId: r.a_id, reviewerName: r.a_name, timeS: r.a_time },
      second: { reviewerId: r.b_id, reviewerName: r.b_name, timeS: r.b_time },
      agreedS: r.agreed_time_s,
      settledAt: new Date(r.settled_at).toISOString(),
    }),
  );
  return { pairs, truncated: rows.length > limit };
}
