import "server-only";
import { originalUrl } from "../clips/steps-inspect";
import type { ClipRow } from "../clips/queries";
import { isTransientToolError, PermanentStepError, type StepOutcome } from "../clips/step-errors";
import { db } from "../db";
import { probePacketTimes } from "./packets";
import { saveFrameIndex } from "./queries";
import { summarizeIndex } from "./summary";

// The frame index step of a clip's pipeline: every frame's timestamp, read from the original.

export async function indexStep(clip: ClipRow): Promise<StepOutcome> {
  const probe = clip.probe;
  if (!probe) throw new Error("the clip has not been verified yet");
  let packets: Awaited<ReturnType<typeof probePacketTimes>>;
  try {
    packets = await probePacketTimes(await originalUrl(clip));
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
  return {
    state: "done",
    detail: { frameCount: summary.frameCount, averageRate: summary.averageRate, variableRate: summary.variableRate, firstPts: summary.firstPts },
  };
}
