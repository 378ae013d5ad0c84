import "server-only";
import type { Actor } from "../auth/actor";
import type { Db } from "../db";
import { AppError } from "../errors";
import { findRun } from "../runs/queries";
import { findSample } from "../samples/queries";
import { assertStaff } from "../submissions/policy";
import { findSubmission } from "../submissions/queries";
import { findClip, type ClipRow } from "./queries";

// Clips are lab evidence: staff read them; manufacturers see results and reports, not recordings.

export async function visibleRunForClips(actor: Actor, q: Db, runId: string): Promise<{ runId: string; submissionId: string; voidedAt: Date | null }> {
  assertStaff(actor, "run");
  const run = await findRun(q, runId);
  if (!run) throw new AppError("not_found", "No such run.");
  const sample = (await findSample(q, run.sampleId))!;
  const submission = (await findSubmission(q, sample.submissionId))!;
  return { runId, submissionId: submission.id, voidedAt: run.voidedAt };
}

export async function visibleClip(actor: Actor, q: Db, clipId: string, opts: { lock?: boolean } = {}): Promise<ClipRow> {
  assertStaff(actor, "clip");
  const clip = await findClip(q, clipId, opts);
  if (!clip) throw new AppError("not_found", "No such clip.");
  return clip;
}
