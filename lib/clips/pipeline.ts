import "server-only";
import { db } from "../db";
import { enqueue, type QueueKey } from "../jobs";
import { findClip, finishStep, listSteps, startStep, updateClip, type ClipRow } from "./queries";
import { STEPS, type Step } from "./rules";
import { PermanentStepError, type StepOutcome } from "./step-errors";
import { hashStep, verifyStep } from "./steps-inspect";
import { indexStep } from "../frame-index/step";
import { proxyStep, thumbnailsStep } from "./steps-render";

// The processing chain of a clip: verify → hash → index → proxy → thumbnails, one queue each.
// Every handler is idempotent: a step already done only passes the clip on to the next step, so a
// job run twice (a worker killed mid-job, a retried send) ends in the same state.

const IMPL: Record<Step, (clip: ClipRow) => Promise<StepOutcome>> = {
  verify: verifyStep,
  hash: hashStep,
  index: indexStep,
  proxy: proxyStep,
  thumbnails: thumbnailsStep,
};

export const QUEUE_OF: Record<Step, QueueKey> = {
  verify: "clipVerify",
  hash: "clipHash",
  index: "clipIndex",
  proxy: "clipProxy",
  thumbnails: "clipThumbnails",
};

/** Thumbnails are a convenience: their failure leaves the clip usable. */
const OPTIONAL: readonly Step[] = ["thumbnails"];

async function passOn(step: Step, clipId: string): Promise<void> {
  const next = STEPS[STEPS.indexOf(step) + 1];
  if (next) await enqueue(QUEUE_OF[next], { clipId });
  else await updateClip(db(), clipId, { status: "ready", readyAt: new Date() });
}

export async function runClipStep(step: Step, clipId: string, attempt: { retryCount: number; retryLimit: number }): Promise<void> {
  const clip = await findClip(db(), clipId);
  if (!clip || clip.status === "rejected" || clip.status === "failed" || clip.status === "uploading") return;
  const row = (await listSteps(db(), clipId)).find((s) => s.step === step);
  if (!row || row.state === "failed") return;
  if (row.state === "done" || row.state === "skipped") return passOn(step, clipId);

  await startStep(db(), clipId, step);
  try {
    const outcome = await IMPL[step](clip);
    await finishStep(db(), clipId, step, outcome.state, outcome.reason ?? null, outcome.detail);
    await passOn(step, clipId);
  } catch (err) {
    const message = err instanceof Error ? err.message : String(err);
    if (err instanceof PermanentStepError || attempt.retryCount >= attempt.retryLimit) {
      const reason = err instanceof PermanentStepError ? message : `Gave up after ${attempt.retryCount + 1} attempts: ${message}`;
      await finishStep(db(), clipId, step, "failed", reason);
      if (OPTIONAL.includes(step)) return passOn(step, clipId);
      await updateClip(db(), clipId, { status: err instanceof PermanentStepError && err.reject ? "rejected" : "failed", rejectReason: reason });
      return;
    }
    await finishStep(db(), clipId, step, "retrying", `Attempt ${attempt.retryCount + 1} failed, will retry: ${message}`);
    throw err;
  }
}
