import "server-only";
import type { Db } from "../db";

// Balls already reported to the manufacturer as below the limit during testing.

export async function listReportedBelow(q: Db, submissionId: string): Promise<string[]> {
  return (await q("below_limit_reports").where({ submission_id: submissionId }).select("sample_id")).map((r: { sample_id: string }) => r.sample_id);
}

export async function insertBelowLimitReports(q: Db, submissionId: string, sampleIds: string[]): Promise<void> {
  if (!sampleIds.length) return;
  await q("below_limit_reports")
    .insert(sampleIds.map((id) => ({ submission_id: submissionId, sample_id: id })))
    .onConflict(["submission_id", "sample_id"])
    .ignore();
}
