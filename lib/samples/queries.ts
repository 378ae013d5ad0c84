import "server-only";
import { isUniqueViolation, type Db } from "../db";
import { AppError } from "../errors";

export interface SampleRow {
  id: string;
  submissionId: string;
  serial: string;
  weightG: number;
  round: number;
  receivedAt: Date;
  acclimationStartedAt: Date | null;
  notes: string;
  runCount: number;
}

export interface NewSample {
  serial: string;
  weightG: number;
  round: number;
  receivedAt: Date;
  acclimationStartedAt: Date | null;
  notes: string;
}

function toSample(r: Record<string, any>): SampleRow {
  return {
    id: r.id,
    submissionId: r.submission_id,
    serial: r.serial,
    weightG: r.weight_g,
    round: r.round,
    receivedAt: r.received_at,
    acclimationStartedAt: r.acclimation_started_at,
    notes: r.notes,
    runCount: Number(r.run_count ?? 0),
  };
}

const base = (q: Db) => q("samples as x").select("x.*", q.raw("(select count(*) from runs r where r.sample_id = x.id) as run_count"));

function duplicate(err: unknown, serial: string): never {
  if (isUniqueViolation(err))
    throw new AppError("conflict", `Serial ${serial} is already recorded for this submission.`, { fields: { serial: "This serial is already recorded." } });
  throw err;
}

export async function insertSamples(q: Db, submissionId: string, samples: NewSample[]): Promise<string[]> {
  if (samples.length === 0) return [];
  try {
    const rows = await q("samples")
      .insert(
        samples.map((s) => ({
          submission_id: submissionId,
          serial: s.serial,
          weight_g: s.weightG,
          round: s.round,
          received_at: s.receivedAt,
          acclimation_started_at: s.acclimationStartedAt,
          notes: s.notes,
        })),
      )
      .returning("id");
    return rows.map((r) => r.id);
  } catch (err) {
    duplicate(err, samples.length === 1 ? samples[0].serial : "in this file");
  }
}

export async function findSample(q: Db, id: string): Promise<SampleRow | undefined> {
  const r = await base(q).where("x.id", id).first();
  return r ? toSample(r) : undefined;
}

export async function listSamples(q: Db, submissionId: string): Promise<SampleRow[]> {
  return (
    await base(q)
      .where("x.submission_id", submissionId)
      .orderBy([{ column: "x.round" }, { column: "x.serial" }])
  ).map(toSample);
}

export async function existingSerials(q: Db, submissionId: string, serials: string[]): Promise<string[]> {
  const rows = await q("samples")
    .where({ submission_id: submissionId })
    .whereRaw("lower(serial) = any(?)", [serials.map((s) => s.toLowerCase())])
    .select("serial");
  return rows.map((r) => r.serial);
}

export async function updateSampleRow(
  q: Db,
  id: string,
  patch: Partial<Pick<NewSample, "serial" | "weightG" | "acclimationStartedAt" | "notes">>,
): Promise<void> {
  const row: Record<string, unknown> = {};
  if (patch.serial !== undefined) row.serial = patch.serial;
  if (patch.weightG !== undefined) row.weight_g = patch.weightG;
  if (patch.acclimationStartedAt !== undefined) row.acclimation_started_at = patch.acclimationStartedAt;
  if (patch.notes !== undefined) row.notes = patch.notes;
  if (Object.keys(row).length === 0) return;
  try {
    await q("samples").where({ id }).update(row);
  } catch (err) {
    duplicate(err, patch.serial ?? "");
  }
}

export async function deleteSampleRow(q: Db, id: string): Promise<void> {
  await q("samples").where({ id }).delete();
}
