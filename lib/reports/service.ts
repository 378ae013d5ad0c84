import "server-only";
import type { Actor } from "../auth/actor";
import { ballsCsv, dropsCsv } from "./csv";
import { reportData } from "./data";
import { renderReportPdf } from "./pdf";

// The report and the exports as files. File names come from the reference only (never from text a
// user typed), reduced to letters, digits and dashes.

export interface ReportFile {
  fileName: string;
  contentType: string;
  body: Buffer | string;
}

const safe = (reference: string) => reference.replace(/[^A-Za-z0-9-]+/g, "-");

export async function reportPdf(actor: Actor, submissionId: string): Promise<ReportFile> {
  const r = await reportData(actor, submissionId);
  return { fileName: `test-report-${safe(r.submission.reference)}.pdf`, contentType: "application/pdf", body: await renderReportPdf(r) };
}

export async function dropsExport(actor: Actor, submissionId: string): Promise<ReportFile> {
  const r = await reportData(actor, submissionId);
  return { fileName: `drops-${safe(r.submission.reference)}.csv`, contentType: "text/csv; charset=utf-8; header=present", body: dropsCsv(r) };
}

export async function ballsExport(actor: Actor, submissionId: string): Promise<ReportFile> {
  const r = await reportData(actor, submissionId);
  return { fileName: `balls-${safe(r.submission.reference)}.csv`, contentType: "text/csv; charset=utf-8; header=present", body: ballsCsv(r) };
}
