import "server-only";
import type { Db } from "../db";
import type { SubmissionKind, SubmissionListQuery, SubmissionStatus, SubmissionValues } from "./schema";

export interface SubmissionRow {
  id: string;
  reference: string;
  organisationId: string;
  organisationName: string;
  modelName: string;
  kind: SubmissionKind;
  weightClassesLb: number[];
  receivedOn: string;
  editionId: string;
  editionName: string;
  status: SubmissionStatus;
  currentRound: number;
  approvalSubmissionId: string | null;
  approvalReference: string | null;
  notes: string;
  sampleCount: number;
  createdAt: Date;
}

function toSubmission(r: Record<string, any>): SubmissionRow {
  return {
    id: r.id,
    reference: r.reference,
    organisationId: r.organisation_id,
    organisationName: r.organisation_name,
    modelName: r.model_name,
    kind: r.kind,
    weightClassesLb: r.weight_classes_lb,
    receivedOn: r.received_on_text,
    editionId: r.edition_id,
    editionName: r.edition_name,
    status: r.status,
    currentRound: r.current_round,
    approvalSubmissionId: r.approval_submission_id,
    approvalReference: r.approval_reference,
    notes: r.notes,
    sampleCount: Number(r.sample_count),
    createdAt: r.created_at,
  };
}

function base(q: Db) {
  return q("submissions as s")
    .join("organisations as o", "o.id", "s.organisation_id")
    .join("specification_editions as e", "e.id", "s.edition_id")
    .leftJoin("submissions as a", "a.id", "s.approval_submission_id")
    .select(
      "s.*",
      "o.name as organisation_name",
      "e.name as edition_name",
      "a.reference as approval_reference",
      q.raw("to_char(s.received_on, 'YYYY-MM-DD') as received_on_text"),
      q.raw("(select count(*) from samples x where x.submission_id = s.id) as sample_count"),
    );
}

const SORT_COLUMNS: Record<SubmissionListQuery["sort"], string> = {
  reference: "s.reference",
  model: "s.model_name",
  organisation: "o.name",
  kind: "s.kind",
  status: "s.status",
  round: "s.current_round",
  received: "s.received_on",
};

export async function findSubmission(q: Db, id: string): Promise<SubmissionRow | undefined> {
  const r = await base(q).where("s.id", id).first();
  return r ? toSubmission(r) : undefined;
}

/** One page of submissions; `organisationId` in `scope` restricts to one organisation. */
export async function listSubmissions(q: Db, f: SubmissionListQuery, scope: { organisationId?: string }): Promise<{ rows: SubmissionRow[]; total: number }> {
  const filtered = base(q).modify((b) => {
    const org = scope.organisationId ?? f.organisationId;
    if (org) b.where("s.organisation_id", org);
    if (scope.organisationId && f.organisationId && f.organisationId !== scope.organisationId) b.whereRaw("false");
    if (f.kind) b.where("s.kind", f.kind);
    if (f.status) b.where("s.status", f.status);
    if (f.round) b.where("s.current_round", f.round);
    if (f.receivedFrom) b.where("s.received_on", ">=", f.receivedFrom);
    if (f.receivedTo) b.where("s.received_on", "<=", f.receivedTo);
    if (f.q) b.where((w) => w.whereILike("s.model_name", `%${escapeLike(f.q!)}%`).orWhereILike("s.reference", `%${escapeLike(f.q!)}%`));
  });
  const [{ n }] = await q.from(filtered.clone().as("f")).count({ n: "*" });
  const rows = await filtered
    .orderBy(SORT_COLUMNS[f.sort], f.dir)
    .orderBy("s.reference", "desc")
    .limit(f.pageSize)
    .offset((f.page - 1) * f.pageSize);
  return { rows: rows.map(toSubmission), total: Number(n) };
}

const escapeLike = (s: string) => s.replace(/[\\%_]/g, (c) => `\\${c}`);

export async function nextReference(q: Db, year: number): Promise<string> {
  const { rows } = await q.raw("select nextval('submission_reference_seq') as n");
  return `S-${year}-${String(rows[0].n).padStart(4, "0")}`;
}

export async function insertSubmission(q: Db, v: SubmissionValues & { reference: string; editionId: string; createdBy: string }): Promise<string> {
  const [row] = await q("submissions")
    .insert({
      reference: v.reference,
      organisation_id: v.organisationId,
      model_name: v.modelName,
      kind: v.kind,
      weight_classes_lb: v.weightClassesLb,
      received_on: v.receivedOn,
      edition_id: v.editionId,
      approval_submission_id: v.approvalSubmissionId ?? null,
      notes: v.notes,
      created_by: v.createdBy,
    })
    .returning("id");
  return row.id;
}

export async function updateSubmissionRow(
  q: Db,
  id: string,
  patch: { modelName?: string; weightClassesLb?: number[]; notes?: string; status?: SubmissionStatus },
): Promise<void> {
  const row: Record<string, unknown> = { updated_at: q.fn.now() };
  if (patch.modelName !== undefined) row.model_name = patch.modelName;
  if (patch.weightClassesLb !== undefined) row.weight_classes_lb = patch.weightClassesLb;
  if (patch.notes !== undefined) row.notes = patch.notes;
  if (patch.status !== undefined) row.status = patch.status;
  await q("submissions").where({ id }).update(row);
}

export async function lockSubmission(q: Db, id: string): Promise<void> {
  await q("submissions").where({ id }).forUpdate().select("id");
}
