import "server-only";
import type { Actor } from "../auth/actor";
import { db } from "../db";
import { AppError } from "../errors";
import { presignGet } from "../storage";
import { visibleClip, visibleRunForClips } from "./access";
import { findFrameIndex, findFrameIndexSummary } from "../frame-index/queries";
import { findRendition } from "./rendition-queries";
import { listClipsOfRun, listSteps, type ClipRow } from "./queries";
import { toClipView, type ClipView } from "./view";

// Reading clips: their processing state, what was learned, and short-lived links to play them.

const sign = (key: string | null | undefined) => (key ? presignGet(key, 3600) : Promise.resolve(null));

async function viewOf(clip: ClipRow): Promise<ClipView> {
  const q = db();
  const [steps, index, rendition] = await Promise.all([listSteps(q, clip.id), findFrameIndexSummary(q, clip.id), findRendition(q, clip.id)]);
  const [original, proxy, poster, filmstrip] = await Promise.all([
    sign(clip.status === "rejected" ? null : clip.objectKey),
    sign(rendition?.proxyKey),
    sign(rendition?.posterKey),
    sign(rendition?.filmstripKey),
  ]);
  return toClipView(clip, steps, index, rendition, { original, proxy, poster, filmstrip });
}

export async function getClip(actor: Actor, clipId: string): Promise<ClipView> {
  return viewOf(await visibleClip(actor, db(), clipId));
}

export async function listRunClips(actor: Actor, runId: string): Promise<ClipView[]> {
  await visibleRunForClips(actor, db(), runId);
  return Promise.all((await listClipsOfRun(db(), runId)).map(viewOf));
}

/** Every frame's presentation timestamp, for the player and for reading times exactly. */
export async function getFrameIndex(actor: Actor, clipId: string) {
  await visibleClip(actor, db(), clipId);
  const index = await findFrameIndex(db(), clipId);
  if (!index) throw new AppError("not_found", "This clip has no frame index yet.");
  return {
    timeBase: index.timeBase,
    frameCount: index.frameCount,
    firstPts: index.firstPts,
    nominalRate: index.nominalRate,
    averageRate: index.averageRate,
    variableRate: index.variableRate,
    keyframes: index.keyframes,
    pts: index.pts,
  };
}
