import "server-only";
import type { Db } from "../db";
import { decodePts, encodePts } from "./pts-codec";
import type { IndexSummary, Rational } from "./summary";

// The frame index table: the timestamp of every frame of a clip, and its summary.

export interface FrameIndexRow extends IndexSummary {
  clipId: string;
  timeBase: Rational;
  nominalRate: string | null;
  keyframes: number[];
  width: number;
  height: number;
  rotation: number;
  codec: string;
  hasBFrames: boolean;
}

export interface FrameIndex extends FrameIndexRow {
  pts: number[];
}

const SUMMARY = [
  "clip_id",
  "time_base_num",
  "time_base_den",
  "frame_count",
  "first_pts",
  "last_pts",
  "nominal_rate",
  "average_rate",
  "variable_rate",
  "keyframes",
  "max_keyframe_interval_s",
  "width",
  "height",
  "rotation",
  "codec",
  "has_b_frames",
];

function toRow(r: Record<string, any>): FrameIndexRow {
  return {
    clipId: r.clip_id,
    timeBase: { num: r.time_base_num, den: r.time_base_den },
    frameCount: r.frame_count,
    firstPts: Number(r.first_pts),
    lastPts: Number(r.last_pts),
    nominalRate: r.nominal_rate,
    averageRate: r.average_rate,
    variableRate: r.variable_rate,
    keyframes: r.keyframes,
    maxKeyframeIntervalS: r.max_keyframe_interval_s,
    width: r.width,
    height: r.height,
    rotation: r.rotation,
    codec: r.codec,
    hasBFrames: r.has_b_frames,
  };
}

/** Replaces the index (a re-run of the job writes the same thing again). */
export async function saveFrameIndex(q: Db, ix: FrameIndex): Promise<void> {
  const row = {
    clip_id: ix.clipId,
    time_base_num: ix.timeBase.num,
    time_base_den: ix.timeBase.den,
    frame_count: ix.frameCount,
    first_pts: ix.firstPts,
    last_pts: ix.lastPts,
    nominal_rate: ix.nominalRate,
    average_rate: ix.averageRate,
    variable_rate: ix.variableRate,
    keyframes: ix.keyframes,
    max_keyframe_interval_s: ix.maxKeyframeIntervalS,
    width: ix.width,
    height: ix.height,
    rotation: ix.rotation,
    codec: ix.codec,
    has_b_frames: ix.hasBFrames,
    pts: encodePts(ix.pts),
  };
  await q("frame_indexes").insert(row).onConflict("clip_id").merge();
}

export async function findFrameIndexSummary(q: Db, clipId: string): Promise<FrameIndexRow | undefined> {
  const r = await q("frame_indexes").where({ clip_id: clipId }).first(SUMMARY);
  return r ? toRow(r) : undefined;
}

export async function findFrameIndex(q: Db, clipId: string): Promise<FrameIndex | undefined> {
  const r = await q("frame_indexes")
    .where({ clip_id: clipId })
    .first([...SUMMARY, "pts"]);
  return r ? { ...toRow(r), pts: decodePts(r.pts) } : undefined;
}
