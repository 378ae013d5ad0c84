import "server-only";
import { randomUUID } from "node:crypto";
import type { z } from "zod";
import type { Actor } from "@/lib/auth/actor";
import { recordChange } from "@/lib/audit/record";
import { db } from "@/lib/db";
import { env } from "@/lib/env";
import { AppError } from "@/lib/errors";
import { enqueue } from "@/lib/jobs";
import { completeMultipartUpload, createMultipartUpload, headObject, objectExists, presignUploadPart } from "@/lib/storage";
import { assertUnlocked } from "@/lib/signoff/lock";
import { assertCanEditIntake } from "@/lib/submissions/policy";
import { visibleClip, visibleRunForClips } from "@/lib/clips/access";
import { findUpload, insertClip, insertSteps, insertUpload, listParts, markUploadCompleted, updateClip, upsertPart } from "@/lib/clips/queries";
import { clipObjectKey } from "@/lib/clips/object-keys";
import { formatBytes } from "@/lib/numbers";
import { planParts } from "@/lib/uploads/rules";
import { STEPS } from "@/lib/clips/rules";
import type { recordPartSchema, startUploadSchema } from "@/lib/clips/schema";

type In<T extends z.ZodType> = z.output<T>;

/**
 * Creates the clip record and a multipart upload; the browser then sends parts straight to storage.
 * A file that cannot be accepted from its size alone is kept on record as rejected, with the reason.
 */
export async function startUpload(actor: Actor, runId: string, v: In<typeof startUploadSchema>) {
  const { submissionId, voidedAt } = await visibleRunForClips(actor, db(), runId);
  assertCanEditIntake(actor);
  if (voidedAt)
    throw new AppError("conflict", "This run is voided: it no longer counts and takes no new recordings. Record a new run for the ball and upload there.");
  // A signed-off submission takes no new evidence until a lead re-opens it; refused before any storage is touched.
  await assertUnlocked(db(), submissionId);
  const max = env().CLIP_MAX_BYTES;
  const refusal =
    v.size === 0
      ? "The file is empty (0 bytes). Export the recording again and upload the new file."
      : v.size > max
        ? `The file is ${formatBytes(v.size)}; the largest recording accepted is ${formatBytes(max)}. Trim it before uploading.`
        : null;
  const id = randomUUID();
  const key = clipObjectKey(id, "original");
  const plan = refusal ? { partSize: 0, partCount: 0 } : planParts(v.size, env().CLIP_PART_SIZE_MB * 1024 * 1024);
  const uploadId = refusal ? null : await createMultipartUpload(key, v.contentType);
  await db().transaction(async (trx) => {
    await insertClip(trx, {
      id,
      runId,
      originalName: v.fileName,
      declaredType: v.contentType,
      declaredSize: v.size,
      objectKey: key,
      uploadedBy: actor.id,
      trim: v.trim ?? null,
    });
    if (refusal) await updateClip(trx, id, { status: "rejected", rejectReason: refusal });
    if (uploadId) await insertUpload(trx, { clipId: id, uploadId, ...plan });
    await recordChange(trx, actor, {
      action: refusal ? "clip.refused" : "clip.upload_started",
      entity: "clip",
      entityId: id,
      after: { runId, fileName: v.fileName, size: v.size, ...plan, reason: refusal, ...(v.trim ? { trim: v.trim } : {}) },
    });
  });
  return {
    clipId: id,
    status: refusal ? ("rejected" as const) : ("uploading" as const),
    rejectReason: refusal,
    ...plan,
    parts: [] as { partNumber: number; size: number }[],
  };
}

async function openUpload(actor: Actor, clipId: string) {
  const clip = await visibleClip(actor, db(), clipId);
  assertCanEditIntake(actor);
  const upload = await findUpload(db(), clipId);
  if (!upload) throw new AppError("not_found", "This clip has no upload.");
  return { clip, upload };
}

/** What the server has recorded so far: a reloaded page resumes from here. */
export async function uploadState(actor: Actor, clipId: string) {
  const { clip, upload } = await openUpload(actor, clipId);
  const parts = (await listParts(db(), clipId)).map((p) => ({ partNumber: p.partNumber, size: p.size }));
  return { clipId, status: clip.status, fileName: clip.originalName, size: clip.declaredSize, partSize: upload.partSize, partCount: upload.partCount, parts };
}

export async function signParts(actor: Actor, clipId: string, partNumbers: number[]) {
  const { clip, upload } = await openUpload(actor, clipId);
  if (clip.status !== "uploading") throw new AppError("conflict", "This upload is already complete.");
  const bad = partNumbers.find((n) => n > upload.partCount);
  if (bad) throw new AppError("validation", `Part ${bad} does not exist: this upload has ${upload.partCount} parts.`);
  const urls = await Promise.all(partNumbers.map(async (n) => ({ partNumber: n, url: await presignUploadPart(clip.objectKey, upload.uploadId, n) })));
  return { urls };
}

export async function recordPart(actor: Actor, clipId: string, partNumber: number, v: In<typeof recordPartSchema>) {
  const { clip, upload } = await openUpload(actor, clipId);
  if (clip.status !== "uploading") return { recorded: partNumber, alreadyComplete: true };
  if (partNumber < 1 || partNumber > upload.partCount)
    throw new AppError("validation", `Part ${partNumber} does not exist: this upload has ${upload.partCount} parts.`);
  await upsertPart(db(), { clipId, partNumber, etag: v.etag, size: v.size });
  return { recorded: partNumber, alreadyComplete: false };
}

/** Completes the upload and queues verification. Safe to call twice: the second call changes nothing. */
export async function completeUpload(actor: Actor, clipId: string) {
  const { clip, upload } = await openUpload(actor, clipId);
  if (clip.status !== "uploading") return { clipId, status: clip.status };
  const parts = await listParts(db(), clipId);
  const missing = Array.from({ length: upload.partCount }, (_, i) => i + 1).filter((n) => !parts.some((p) => p.partNumber === n));
  if (missing.length)
    throw new AppError(
      "conflict",
      `The upload is not finished: part${missing.length > 1 ? "s" : ""} ${missing.slice(0, 10).join(", ")}${missing.length > 10 ? "…" : ""} still to send.`,
    );
  try {
    await completeMultipartUpload(clip.objectKey, upload.uploadId, parts);
  } catch (err) {
    // A completion that went through but whose answer was lost: the object is there.
    if (!(await objectExists(clip.objectKey)))
      throw new AppError("unavailable", "The object store did not accept the upload. Try completing it again.", { cause: err });
  }
  const stored = (await headObject(clip.objectKey)).size;
  const tooLarge = stored > env().CLIP_MAX_BYTES;
  await db().transaction(async (trx) => {
    const locked = await visibleClip(actor, trx, clipId, { lock: true });
    if (locked.status !== "uploading") return;
    await markUploadCompleted(trx, clipId);
    await updateClip(
      trx,
      clipId,
      tooLarge
        ? {
            status: "rejected",
            storedSize: stored,
            uploadedAt: new Date(),
            rejectReason: `The stored file is ${formatBytes(stored)}; the largest recording accepted is ${formatBytes(env().CLIP_MAX_BYTES)}.`,
          }
        : { status: "processing", storedSize: stored, uploadedAt: new Date() },
    );
    if (!tooLarge) await insertSteps(trx, clipId, STEPS);
    await recordChange(trx, actor, {
      action: "clip.uploaded",
      entity: "clip",
      entityId: clipId,
      after: { storedSize: stored, parts: parts.length, rejected: tooLarge },
    });
  });
  if (!tooLarge) await enqueue("clipVerify", { clipId });
  return { clipId, status: tooLarge ? "rejected" : "processing" };
}
