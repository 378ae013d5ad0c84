import { db } from "../db";
import { env } from "../env";
import { getObjectStream, presignGet, sha256OfStream } from "../storage";
import { probePacketTimes } from "../video/ffprobe-packets";
import { probeMedia } from "../video/probe";
import { saveFrameIndex } from "./index-queries";
import { findFirstWithHash, updateClip, type ClipRow } from "./queries";
import { summarizeIndex } from "./rules";
import { isTransientToolError, PermanentStepError, type StepOutcome } from "./step-errors";
import { reasonFromProbeError, verdictFromProbe } from "./verify-rules";

// The steps that read the original: verify, hash, index. Each reads the object by streaming it.

const url = (clip: ClipRow) => presignGet(clip.objectKey, 6 * 3600);

export async function verifyStep(clip: ClipRow): Promise<StepOutcome> {
  const result = await probeMedia(await url(clip));
  if (!result.ok) {
    if (isTransientToolError(result.stderr)) throw new Error(`ffprobe could not reach the file: ${result.stderr.trim().slice(-300)}`);
    throw new PermanentStepError(reasonFromProbeError(result.stderr, clip.storedSize ?? 0), true);
  }
  const verdict = verdictFromProbe(result.json, env().CLIP_CONTAINERS.split(",").map((s) => s.trim()));
  if (!verdict.ok) throw new PermanentStepError(verdict.reason, true);
  await updateClip(db(), clip.id, { probe: verdict.probe });
  const v = verdict.probe.video;
  return { state: "done", detail: { format: verdict.probe.formatName, codec: v.codec, width: v.width, height: v.height, durationS: verdict.probe.durationS } };
}

export async function hashStep(clip: ClipRow): Promise<StepOutcome> {
  const sha256 = await sha256OfStream(await getObjectStream(clip.objectKey));
  const duplicateOf = (await findFirstWithHash(db(), sha256, clip.id)) ?? null;
  await updateClip(db(), clip.id, { sha256, duplicateOf });
  return { state: "done", reason: duplicateOf ? "The same bytes were uploaded before: this clip is flagged as a duplicate." : undefined, detail: { sha256, duplicateOf } };
}

export async function indexStep(clip: ClipRow): Promise<StepOutcome> {
  const probe = clip.probe;
  if (!probe) throw new Error("the clip has not been verified yet");
  let packets;
  try {
    packets = await probePacketTimes(await url(clip));
  } catch (err) {
    const message = err instanceof Error ? err.message : String(err);
    if (isTransientToolError(message)) throw err;
    throw new PermanentStepError(`The frame timestamps could not be read: ${message.slice(0, 300)}`, true);
  }
  const pts = packets.pts.map(Number);
  if (pts.length === 0) throw new PermanentStepError("The video stream has no frames.", true);
  const summary = summarizeIndex(pts, packets.timeBase, packets.keyframes);
  await saveFrameIndex(db(), {
    clipId: clip.id,
    ...summary,
    timeBase: packets.timeBase,
    nominalRate: probe.video.nominalRate,
    keyframes: packets.keyframes,
    width: probe.video.width,
    height: probe.video.height,
    rotation: probe.video.rotation,
    codec: probe.video.codec,
    hasBFrames: probe.video.hasBFrames,
    pts,
  });
  return { state: "done", detail: { frameCount: summary.frameCount, averageRate: summary.averageRate, variableRate: summary.variableRate, firstPts: summary.firstPts } };
}
