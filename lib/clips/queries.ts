import "server-only";
import type { Db } from "../db";
import type { TrimSource } from "./schema";
import type { ProbeSummary } from "./verify-rules";
import type { ClipStatus, Step } from "./rules";

export interface ClipRow {
  id: string;
  runId: string;
  originalName: string;
  declaredType: string;
  declaredSize: number;
  storedSize: number | null;
  objectKey: string;
  status: ClipStatus;
  rejectReason: string | null;
  sha256: string | null;
  duplicateOf: string | null;
  probe: ProbeSummary | null;
  trim: TrimSource | null;
  uploadedBy: string;
  createdAt: Date;
  uploadedAt: Date | null;
  readyAt: Date | null;
}

export type StepState = "pending" | "running" | "retrying" | "done" | "skipped" | "failed";

export interface StepRow {
  step: Step;
  state: StepState;
  attempts: number;
  reason: string | null;
  detail: Record<string, unknown> | null;
  startedAt: Date | null;
  finishedAt: Date | null;
}

function toClip(r: Record<string, any>): ClipRow {
  return {
    id: r.id,
    runId: r.run_id,
    originalName: r.original_name,
    declaredType: r.declared_type,
    declaredSize: Number(r.declared_size),
    storedSize: r.stored_size === null ? null : Number(r.stored_size),
    objectKey: r.object_key,
    status: r.status,
    rejectReason: r.reject_reason,
    sha256: r.sha256,
    duplicateOf: r.duplicate_of,
    probe: r.probe,
    trim: r.trim ?? null,
    uploadedBy: r.uploaded_by,
    createdAt: r.created_at,
    uploadedAt: r.uploaded_at,
    readyAt: r.ready_at,
  };
}

export async function insertClip(
  q: Db,
  c: {
    id: string;
    runId: string;
    originalName: string;
    declaredType: string;
    declaredSize: number;
    objectKey: string;
    uploadedBy: string;
    trim?: TrimSource | null;
  },
): Promise<void> {
  await q("clips").insert({
    id: c.id,
    run_id: c.runId,
    original_name: c.originalName,
    declared_type: c.declaredType,
    declared_size: c.declaredSize,
    object_key: c.objectKey,
    uploaded_by: c.uploadedBy,
    trim: c.trim ? JSON.stringify(c.trim) : null,
  });
}

export async function findClip(q: Db, id: string, opts: { lock?: boolean } = {}): Promise<ClipRow | undefined> {
  const query = q("clips").where({ id }).first();
  if (opts.lock) query.forUpdate();
  const r = await query;
  return r ? toClip(r) : undefined;
}

export async function listClipsOfRun(q: Db, runId: string): Promise<ClipRow[]> {
  return (await q("clips").where({ run_id: runId }).orderBy("created_at")).map(toClip);
}

export async function updateClip(
  q: Db,
  id: string,
  patch: Partial<{
    status: ClipStatus;
    rejectReason: string | null;
    storedSize: number;
    sha256: string;
    duplicateOf: string | null;
    probe: ProbeSummary;
    uploadedAt: Date;
    readyAt: Date;
  }>,
): Promise<void> {
  const map: Record<string, string> = {
    status: "status",
    rejectReason: "reject_reason",
    storedSize: "stored_size",
    sha256: "sha256",
    duplicateOf: "duplicate_of",
    probe: "probe",
    uploadedAt: "uploaded_at",
    readyAt: "ready_at",
  };
  const row: Record<string, unknown> = {};
  for (const [k, v] of Object.entries(patch)) row[map[k]] = k === "probe" ? JSON.stringify(v) : v;
  if (Object.keys(row).length) await q("clips").where({ id }).update(row);
}

/** The earliest other clip with the same bytes, if any. */
export async function findFirstWithHash(q: Db, sha256: string, exceptId: string): Promise<string | undefined> {
  const r = await q("clips").where({ sha256 }).whereNot({ id: exceptId }).orderBy("created_at").first("id");
  return r?.id;
}

export async function insertUpload(q: Db, u: { clipId: string; uploadId: string; partSize: number; partCount: number }): Promise<void> {
  await q("clip_uploads").insert({ clip_id: u.clipId, upload_id: u.uploadId, part_size: u.partSize, part_count: u.partCount });
}

export async function findUpload(
  q: Db,
  clipId: string,
): Promise<{ uploadId: string; partSize: number; partCount: number; completedAt: Date | null } | undefined> {
  const r = await q("clip_uploads").where({ clip_id: clipId }).first();
  return r ? { uploadId: r.upload_id, partSize: r.part_size, partCount: r.part_count, completedAt: r.completed_at } : undefined;
}

export async function markUploadCompleted(q: Db, clipId: string): Promise<void> {
  await q("clip_uploads").where({ clip_id: clipId }).update({ completed_at: q.fn.now() });
}

/** Recording a part twice (a retried request) keeps the latest ETag: idempotent. */
export async function upsertPart(q: Db, p: { clipId: string; partNumber: number; etag: string; size: number }): Promise<void> {
  await q("clip_upload_parts")
    .insert({ clip_id: p.clipId, part_number: p.partNumber, etag: p.etag, size: p.size })
    .onConflict(["clip_id", "part_number"])
    .merge({ etag: p.etag, size: p.size, recorded_at: q.fn.now() });
}

export async function listParts(q: Db, clipId: string): Promise<{ partNumber: number; etag: string; size: number }[]> {
  const rows = await q("clip_upload_parts").where({ clip_id: clipId }).orderBy("part_number");
  return rows.map((r) => ({ partNumber: r.part_number, etag: r.etag, size: Number(r.size) }));
}

export async function insertSteps(q: Db, clipId: string, steps: readonly Step[]): Promise<void> {
  await q("clip_steps")
    .insert(steps.map((step) => ({ clip_id: clipId, step })))
    .onConflict(["clip_id", "step"])
    .ignore();
}

export async function listSteps(q: Db, clipId: string): Promise<StepRow[]> {
  const rows = await q("clip_steps").where({ clip_id: clipId });
  return rows.map((r) => ({
    step: r.step,
    state: r.state,
    attempts: r.attempts,
    reason: r.reason,
    detail: r.detail,
    startedAt: r.started_at,
    finishedAt: r.finished_at,
  }));
}

export async function startStep(q: Db, clipId: string, step: Step): Promise<void> {
  await q("clip_steps")
    .where({ clip_id: clipId, step })
    .update({ state: "running", attempts: q.raw("attempts + 1"), started_at: q.fn.now(), finished_at: null });
}

export async function finishStep(q: Db, clipId: string, step: Step, state: StepState, reason: string | null, detail?: Record<string, unknown>): Promise<void> {
  const done = state === "done" || state === "skipped" || state === "failed";
  await q("clip_steps")
    .where({ clip_id: clipId, step })
    .update({ state, reason, detail: detail === undefined ? null : JSON.stringify(detail), finished_at: done ? q.fn.now() : null });
}
