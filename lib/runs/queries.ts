import "server-only";
import type { Db } from "../db";
import type { RunValues } from "./schema";

export interface RunRow {
  id: string;
  sampleId: string;
  testedAt: Date;
  technicianId: string;
  technicianName: string;
  roomTempC: number;
  surfaceTempC: number;
  prepMethod: string;
  prepAbrasive: string;
  prepPadPosition: string;
  prepNotes: string;
  roughnessRaUm: number[];
  oilLot: string;
  dispenserCheckValue: number | null;
  dispenserCheckUnit: "mg" | "uL" | null;
  cameraId: string;
  notes: string;
  acceptedBy: string | null;
  acceptedByName: string | null;
  acceptedAt: Date | null;
  acceptReason: string | null;
  /** A lead voided the run: it stays on record and no longer counts. */
  voidedBy: string | null;
  voidedByName: string | null;
  voidedAt: Date | null;
  voidReason: string | null;
  createdAt: Date;
  dropCount: number;
}

export type RunColumns = Omit<RunValues, "roomTemp" | "surfaceTemp" | "dispenserCheck"> & {
  roomTempC: number;
  surfaceTempC: number;
  dispenserCheck: RunValues["dispenserCheck"];
};

function toRun(r: Record<string, any>): RunRow {
  return {
    id: r.id,
    sampleId: r.sample_id,
    testedAt: r.tested_at,
    technicianId: r.technician_id,
    technicianName: r.technician_name,
    roomTempC: r.room_temp_c,
    surfaceTempC: r.surface_temp_c,
    prepMethod: r.prep_method,
    prepAbrasive: r.prep_abrasive,
    prepPadPosition: r.prep_pad_position,
    prepNotes: r.prep_notes,
    roughnessRaUm: r.roughness_ra_um,
    oilLot: r.oil_lot,
    dispenserCheckValue: r.dispenser_check_value,
    dispenserCheckUnit: r.dispenser_check_unit,
    cameraId: r.camera_id,
    notes: r.notes,
    acceptedBy: r.accepted_by,
    acceptedByName: r.accepted_by_name,
    acceptedAt: r.accepted_at,
    acceptReason: r.accept_reason,
    voidedBy: r.voided_by,
    voidedByName: r.voided_by_name,
    voidedAt: r.voided_at,
    voidReason: r.void_reason,
    createdAt: r.created_at,
    dropCount: Number(r.drop_count),
  };
}

const base = (q: Db) =>
  q("runs as r")
    .join("users as t", "t.id", "r.technician_id")
    .leftJoin("users as a", "a.id", "r.accepted_by")
    .leftJoin("users as v", "v.id", "r.voided_by")
    .select(
      "r.*",
      "t.name as technician_name",
      "a.name as accepted_by_name",
      "v.name as voided_by_name",
      q.raw("(select count(*) from drops d where d.run_id = r.id) as drop_count"),
    );

function columns(v: RunColumns) {
  return {
    tested_at: v.testedAt,
    room_temp_c: v.roomTempC,
    surface_temp_c: v.surfaceTempC,
    prep_method: v.prepMethod,
    prep_abrasive: v.prepAbrasive,
    prep_pad_position: v.prepPadPosition,
    prep_notes: v.prepNotes,
    roughness_ra_um: v.roughnessRaUm,
    oil_lot: v.oilLot,
    dispenser_check_value: v.dispenserCheck?.value ?? null,
    dispenser_check_unit: v.dispenserCheck?.unit ?? null,
    camera_id: v.cameraId,
    notes: v.notes,
  };
}

export async function insertRun(q: Db, sampleId: string, technicianId: string, v: RunColumns, drops: number): Promise<string> {
  const [row] = await q("runs")
    .insert({ ...columns(v), sample_id: sampleId, technician_id: technicianId })
    .returning("id");
  await q("drops").insert(Array.from({ length: drops }, (_, i) => ({ run_id: row.id, ordinal: i + 1 })));
  return row.id;
}

/** Replaces the conditions; any earlier acceptance of flagged conditions no longer applies. */
export async function updateRunRow(q: Db, id: string, v: RunColumns): Promise<void> {
  await q("runs")
    .where({ id })
    .update({ ...columns(v), accepted_by: null, accepted_at: null, accept_reason: null, updated_at: q.fn.now() });
}

export async function setAcceptance(q: Db, id: string, by: string, reason: string): Promise<void> {
  await q("runs").where({ id }).update({ accepted_by: by, accepted_at: q.fn.now(), accept_reason: reason, updated_at: q.fn.now() });
}

export async function setVoid(q: Db, id: string, by: string, reason: string): Promise<void> {
  await q("runs").where({ id }).update({ voided_by: by, voided_at: q.fn.now(), void_reason: reason, updated_at: q.fn.now() });
}

export async function findRun(q: Db, id: string, opts: { lock?: boolean } = {}): Promise<RunRow | undefined> {
  const query = base(q).where("r.id", id).first();
  if (opts.lock) query.forUpdate("r");
  const r = await query;
  return r ? toRun(r) : undefined;
}

/**
 * Every run of the submission, in the order that decides which of a ball's runs counts (the last
 * one not voided: `rules.ts` `countingRun`). Tested at is kept to the minute, so two runs can share
 * it: the one recorded later comes after, and the id settles even that. A total order, so the run
 * that counts never depends on where rows happen to sit.
 */
export async function listRunsOfSubmission(q: Db, submissionId: string): Promise<RunRow[]> {
  const rows = await base(q)
    .join("samples as x", "x.id", "r.sample_id")
    .where("x.submission_id", submissionId)
    .orderBy([{ column: "r.tested_at" }, { column: "r.created_at" }, { column: "r.id" }]);
  return rows.map(toRun);
}

export interface RunConditionsRow {
  submissionId: string;
  accepted: boolean;
  input: { testedAt: Date; acclimationStartedAt: Date | null; surfaceTempC: number; roughnessRaUm: number[] };
  limits: { minAcclimationH: number; surfaceTempMinC: number; surfaceTempMaxC: number; roughnessMaxSdUm: number };
}

/** Just what the conditions check needs, for every run of several submissions at once (list pages). */
export async function findRunConditions(q: Db, submissionIds: string[]): Promise<RunConditionsRow[]> {
  if (submissionIds.length === 0) return [];
  const rows = await q("runs as r")
    .join("samples as x", "x.id", "r.sample_id")
    .join("submissions as s", "s.id", "x.submission_id")
    .join("specification_editions as e", "e.id", "s.edition_id")
    .whereIn("s.id", submissionIds)
    .whereNull("r.voided_at")
    .select(
      "s.id as submission_id",
      "r.accepted_at",
      "r.tested_at",
      "x.acclimation_started_at",
      "r.surface_temp_c",
      "r.roughness_ra_um",
      "e.min_acclimation_h",
      "e.surface_temp_min_c",
      "e.surface_temp_max_c",
      "e.roughness_max_sd_um",
    );
  return rows.map((r) => ({
    submissionId: r.submission_id,
    accepted: r.accepted_at !== null,
    input: { testedAt: r.tested_at, acclimationStartedAt: r.acclimation_started_at, surfaceTempC: r.surface_temp_c, roughnessRaUm: r.roughness_ra_um },
    limits: {
      minAcclimationH: r.min_acclimation_h,
      surfaceTempMinC: r.surface_temp_min_c,
      surfaceTempMaxC: r.surface_temp_max_c,
      roughnessMaxSdUm: r.roughness_max_sd_um,
    },
  }));
}
