import "server-only";
import type { Db } from "../db";
import { trimKept } from "../clips/trim-provenance";
import { listSubmissionDrops } from "../readings/settled-queries";

// What the report adds to the results: each settled drop's marks and clip, and the clips' identity.

export interface ReportReading {
  slot: number;
  reader: string;
  dispenseFrame: number;
  clearFrame: number;
  timeS: number;
}

export interface ReportDropRow {
  id: string;
  runId: string;
  ordinal: number;
  state: string;
  clipId: string | null;
  /** The current submitted reading of each slot; empty unless the drop is settled. */
  readings: ReportReading[];
}

export interface ReportClipRow {
  id: string;
  runId: string;
  originalName: string;
  sha256: string | null;
  frameCount: number | null;
  rate: string | null;
  averageRate: number | null;
  /** Seconds per tick of the clip's frame timestamps, as num/den; null before it is indexed. */
  timeBase: { num: number; den: number } | null;
  /** For a clip trimmed in the browser: the window asked for and the frames really kept, in words. */
  trimNote: string | null;
}

/** Marks of settled drops only (lib/readings/settled-queries.ts), so nothing of a drop still being read blind leaves this query. */
export async function listReportDrops(q: Db, submissionId: string): Promise<ReportDropRow[]> {
  return (await listSubmissionDrops(q, submissionId)).map((d) => ({
    id: d.id,
    runId: d.runId,
    ordinal: d.ordinal,
    state: d.state,
    clipId: d.clipId,
    readings: d.readings.map(({ slot, reader, dispenseFrame, clearFrame, timeS }) => ({ slot, reader, dispenseFrame, clearFrame, timeS })),
  }));
}

/** The ready clips of the submission's runs, with their hash and frame index summary. */
export async function listReportClips(q: Db, submissionId: string): Promise<ReportClipRow[]> {
  const rows = await q("clips as c")
    .join("runs as r", "r.id", "c.run_id")
    .join("samples as x", "x.id", "r.sample_id")
    .leftJoin("frame_indexes as f", "f.clip_id", "c.id")
    .where("x.submission_id", submissionId)
    .where("c.status", "ready")
    .orderBy([{ column: "x.round" }, { column: "x.serial" }, { column: "c.created_at" }])
    .select(
      "c.id",
      "c.run_id",
      "c.original_name",
      "c.sha256",
      "c.trim",
      "f.frame_count",
      "f.nominal_rate",
      "f.average_rate",
      "f.first_pts",
      "f.last_pts",
      "f.time_base_num",
      "f.time_base_den",
    );
  return rows.map((r) => ({
    id: r.id,
    runId: r.run_id,
    originalName: r.original_name,
    sha256: r.sha256,
    frameCount: r.frame_count,
    rate: r.nominal_rate,
    averageRate: r.average_rate,
    timeBase: r.time_base_num ? { num: r.time_base_num, den: r.time_base_den } : null,
    trimNote: r.trim
      ? trimKept(
          r.trim,
          r.frame_count ? { firstPts: Number(r.first_pts), lastPts: Number(r.last_pts), timeBase: { num: r.time_base_num, den: r.time_base_den } } : null,
        ).note
      : null,
  }));
}
