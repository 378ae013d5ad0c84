import type { Db } from "../db";

// Balls already reported to the manufacturer as below the limit during testing.

export async function listReportedBelow(q: Db, submissionId: string): Promise<string[]> {
  return (await q("below_limit_reports").where({ submission_id: submissionId }).select("sample_id")).map((r: { sample_id: string }) => r.sample_id);
}

/** Drops of a run not yet in one of `settled` states: a ball has a result only when there are none. */
export async function countUnsettledDrops(q: Db, runId: string, settled: readonly string[]): Promise<number> {
  const r = await q("drops").where({ run_id: runId }).whereNotIn("state", settled).count<{ n: string }[]>("* as n").first();
  return Number(r?.n ?? 0);
}

export async function insertBelowLimitReports(q: Db, submissionId: string, sampleIds: string[]): Promise<void> {
  if (!sampleIds.length) return;
  await q("below_limit_reports").insert(sampleIds.map((id) => ({ submission_id: submissionId, sample_id: id }))).onConflict(["submission_id", "sample_id"]).ignore();
}
