import "server-only";
import { db } from "../db";
import { env } from "../env";
import { getObjectStream, presignGet, sha256OfStream } from "../storage";
import { probeMedia } from "../video/probe";
import { findFirstWithHash, updateClip, type ClipRow } from "./queries";
import { isTransientToolError, PermanentStepError, type StepOutcome } from "./step-errors";
import { reasonFromProbeError, verdictFromProbe } from "./verify-rules";

// The steps that read the original: verify and hash (the index step is lib/frame-index/step.ts).

export const originalUrl = (clip: ClipRow) => presignGet(clip.objectKey, 6 * 3600);

export async function verifyStep(clip: ClipRow): Promise<StepOutcome> {
  const result = await probeMedia(await originalUrl(clip));
  if (!result.ok) {
    if (isTransientToolError(result.stderr)) throw new Error(`ffprobe could not reach the file: ${result.stderr.trim().slice(-300)}`);
    throw new PermanentStepError(reasonFromProbeError(result.stderr, clip.storedSize ?? 0), true);
  }
  const verdict = verdictFromProbe(
    result.json,
    env()
      .CLIP_CONTAINERS.split(",")
      .map((s) => s.trim()),
  );
  if (!verdict.ok) throw new PermanentStepError(verdict.reason, true);
  await updateClip(db(), clip.id, { probe: verdict.probe });
  const v = verdict.probe.video;
  return { state: "done", detail: { format: verdict.probe.formatName, codec: v.codec, width: v.width, height: v.height, durationS: verdict.probe.durationS } };
}

export async function hashStep(clip: ClipRow): Promise<StepOutcome> {
  const sha256 = await sha256OfStream(await getObjectStream(clip.objectKey));
  const duplicateOf = (await findFirstWithHash(db(), sha256, clip.id)) ?? null;
  await updateClip(db(), clip.id, { sha256, duplicateOf });
  return {
    state: "done",
    reason: duplicateOf ? "The same bytes were uploaded before: this clip is flagged as a duplicate." : undefined,
    detail: { sha256, duplicateOf },
  };
}
