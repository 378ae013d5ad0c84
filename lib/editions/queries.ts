import "server-only";
import type { Db } from "../db";
import { AppError } from "../errors";
import type { BelowMinimumRule, Criterion, EditionValues } from "./schema";

export interface EditionRow {
  id: string;
  name: string;
  effectiveFrom: string;
  minAbsorptionS: number;
  criterion: Criterion;
  belowMinimumRule: BelowMinimumRule;
  dropsPerBall: number;
  guardBandS: number;
  roundSizes: number[];
  toleranceCoverage: number;
  toleranceConfidence: number;
  readingToleranceS: number;
  minAcclimationH: number;
  surfaceTempMinC: number;
  surfaceTempMaxC: number;
  roughnessMaxSdUm: number;
  sources: Record<string, string>;
  notes: string;
  basedOnId: string | null;
  createdAt: Date;
  submissionCount: number;
}

function toEdition(r: Record<string, any>): EditionRow {
  return {
    id: r.id,
    name: r.name,
    effectiveFrom: r.effective_from_text,
    minAbsorptionS: r.min_absorption_s,
    criterion: r.criterion,
    belowMinimumRule: r.below_minimum_rule,
    dropsPerBall: r.drops_per_ball,
    guardBandS: r.guard_band_s,
    roundSizes: r.round_sizes,
    toleranceCoverage: r.tolerance_coverage,
    toleranceConfidence: r.tolerance_confidence,
    readingToleranceS: r.reading_tolerance_s,
    minAcclimationH: r.min_acclimation_h,
    surfaceTempMinC: r.surface_temp_min_c,
    surfaceTempMaxC: r.surface_temp_max_c,
    roughnessMaxSdUm: r.roughness_max_sd_um,
    sources: r.sources ?? {},
    notes: r.notes,
    basedOnId: r.based_on_id,
    createdAt: r.created_at,
    submissionCount: Number(r.submission_count ?? 0),
  };
}

function base(q: Db) {
  return q("specification_editions as e").select(
    "e.*",
    q.raw("to_char(e.effective_from, 'YYYY-MM-DD') as effective_from_text"),
    q.raw("(select count(*) from submissions s where s.edition_id = e.id) as submission_count"),
  );
}

function toColumns(v: EditionValues) {
  return {
    name: v.name,
    effective_from: v.effectiveFrom,
    min_absorption_s: v.minAbsorptionS,
    criterion: v.criterion,
    below_minimum_rule: v.belowMinimumRule,
    drops_per_ball: v.dropsPerBall,
    guard_band_s: v.guardBandS,
    round_sizes: v.roundSizes,
    tolerance_coverage: v.toleranceCoverage,
    tolerance_confidence: v.toleranceConfidence,
    reading_tolerance_s: v.readingToleranceS,
    min_acclimation_h: v.minAcclimationH,
    surface_temp_min_c: v.surfaceTempMinC,
    surface_temp_max_c: v.surfaceTempMaxC,
    roughness_max_sd_um: v.roughnessMaxSdUm,
    sources: JSON.stringify(v.sources),
    notes: v.notes,
  };
}

function mapWriteError(err: unknown, name: string): never {
  const e = err as { code?: string; constraint?: string };
  if (e.code === "23505") throw new AppError("conflict", `An edition named ${name} already exists.`, { fields: { name: "This name is already used." } });
  if (e.constraint === "editions_immutable_in_use")
    throw new AppError("conflict", "This edition is used by a submission and cannot be changed. Create a new edition from it instead.");
  throw err;
}

export async function listEditions(q: Db): Promise<EditionRow[]> {
  return (await base(q).orderBy("e.effective_from", "desc").orderBy("e.created_at", "desc")).map(toEdition);
}

export async function findEdition(q: Db, id: string): Promise<EditionRow | undefined> {
  const r = await base(q).where("e.id", id).first();
  return r ? toEdition(r) : undefined;
}

/** The edition in force on a date: the latest that took effect on or before it. */
export async function findEditionInForce(q: Db, onDate: string): Promise<EditionRow | undefined> {
  const r = await base(q).where("e.effective_from", "<=", onDate).orderBy("e.effective_from", "desc").orderBy("e.created_at", "desc").first();
  return r ? toEdition(r) : undefined;
}

export async function insertEdition(q: Db, v: EditionValues, createdBy: string): Promise<string> {
  try {
    const [row] = await q("specification_editions")
      .insert({ ...toColumns(v), based_on_id: v.basedOnId ?? null, created_by: createdBy })
      .returning("id");
    return row.id;
  } catch (err) {
    mapWriteError(err, v.name);
  }
}

export async function updateEdition(q: Db, id: string, v: EditionValues): Promise<void> {
  try {
    await q("specification_editions").where({ id }).update(toColumns(v));
  } catch (err) {
    mapWriteError(err, v.name);
  }
}

export async function submissionsUsingEdition(q: Db, id: string): Promise<{ id: string; reference: string; modelName: string }[]> {
  return q("submissions").where({ edition_id: id }).orderBy("reference").select("id", "reference", "model_name as modelName");
}
