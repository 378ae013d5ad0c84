import "server-only";
import { mkdtemp, rm } from "node:fs/promises";
import os from "node:os";
import path from "node:path";
import { db } from "../db";
import { presignGet, putObjectFile } from "../storage";
import { probePacketTimes } from "../frame-index/packets";
import { buildProxy } from "../video/proxy";
import { renderThumbnails } from "../video/thumbnails";
import { findFrameIndex } from "../frame-index/queries";
import { findRendition, saveProxy, saveThumbnails } from "./rendition-queries";
import { proxyBuildFailure, proxyGop, proxyMismatch, proxyRefusal } from "./proxy-rules";
import type { ClipRow } from "./queries";
import { clipObjectKey } from "./object-keys";
import { stepsWellInBrowser } from "./proxy-rules";
import { isTransientToolError, PermanentStepError, type StepOutcome } from "./step-errors";

// The steps that write renditions: the stepping proxy and the thumbnails. Work files live in a
// temporary folder that is always removed; results go to the object store.

async function inTempDir<T>(clipId: string, work: (dir: string) => Promise<T>): Promise<T> {
  const dir = await mkdtemp(path.join(os.tmpdir(), `wickmark-${clipId.slice(0, 8)}-`));
  try {
    return await work(dir);
  } finally {
    await rm(dir, { recursive: true, force: true });
  }
}

export async function proxyStep(clip: ClipRow): Promise<StepOutcome> {
  const index = await findFrameIndex(db(), clip.id);
  if (!index || !clip.probe) throw new Error("the frame index is not built yet");
  const decision = stepsWellInBrowser({
    formatName: clip.probe.formatName,
    codec: index.codec,
    hasBFrames: index.hasBFrames,
    firstPts: index.firstPts,
    maxKeyframeIntervalS: index.maxKeyframeIntervalS,
  });
  if (decision.ok) {
    await saveProxy(db(), clip.id, { proxyKey: null, proxyReason: decision.reason, proxyOffsetPts: null });
    return { state: "skipped", reason: `Not needed: ${decision.reason}.` };
  }
  return inTempDir(clip.id, async (dir) => {
    const out = path.join(dir, "proxy.mp4");
    try {
      await buildProxy(await presignGet(clip.objectKey, 6 * 3600), out, { timescale: index.timeBase.den, gop: proxyGop(index.averageRate) });
    } catch (err) {
      const message = err instanceof Error ? err.message : String(err);
      if (isTransientToolError(message)) throw err;
      throw new PermanentStepError(proxyBuildFailure(message));
    }
    const made = await probePacketTimes(out);
    const problem = proxyMismatch(index, { pts: made.pts.map(Number), timeBase: made.timeBase });
    if (problem) throw new PermanentStepError(proxyRefusal(problem));
    const key = clipObjectKey(clip.id, "proxy.mp4");
    await putObjectFile(key, out, "video/mp4");
    await saveProxy(db(), clip.id, { proxyKey: key, proxyReason: `Made because ${decision.reason}.`, proxyOffsetPts: index.firstPts });
    return { state: "done", reason: `Made because ${decision.reason}.`, detail: { frames: made.pts.length, keyframes: made.keyframes.length } };
  });
}

export async function thumbnailsStep(clip: ClipRow): Promise<StepOutcome> {
  const index = await findFrameIndex(db(), clip.id);
  const rendition = await findRendition(db(), clip.id);
  if (!index) throw new Error("the frame index is not built yet");
  const source = rendition?.proxyKey ?? clip.objectKey;
  const durationS = ((index.lastPts - index.firstPts) * index.timeBase.num) / index.timeBase.den;
  return inTempDir(clip.id, async (dir) => {
    const { poster, filmstrip } = await renderThumbnails(await presignGet(source, 3600), Math.max(durationS, 0.001), dir);
    const posterKey = clipObjectKey(clip.id, "poster.jpg");
    const filmstripKey = clipObjectKey(clip.id, "filmstrip.jpg");
    await putObjectFile(posterKey, poster, "image/jpeg");
    await putObjectFile(filmstripKey, filmstrip, "image/jpeg");
    await saveThumbnails(db(), clip.id, { posterKey, filmstripKey, filmstripTiles: 10 });
    return { state: "done" };
  });
}
