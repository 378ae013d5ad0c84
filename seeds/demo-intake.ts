import type { Knex } from "knex";

// The invented intake scenario: a demo edition whose every default says where it comes from,
// two manufacturers, submissions in round 1 and round 2, and a surveillance submission.
export const DEMO_EDITION = {
  name: "Demo edition 2026-A (invented)",
  effective_from: "2026-01-01",
  min_absorption_s: 135,
  criterion: "ball_mean",
  below_minimum_rule: "fails",
  drops_per_ball: 3,
  guard_band_s: 10,
  round_sizes: [2, 8, 24],
  tolerance_coverage: 0.9,
  tolerance_confidence: 0.95,
  reading_tolerance_s: 0.5,
  min_acclimation_h: 24,
  surface_temp_min_c: 20,
  surface_temp_max_c: 24,
  roughness_max_sd_um: 0.1,
  sources: {
    minAbsorptionS: "135 s (2 min 15 s) is a widely used minimum, quoted from memory; confirm it against the governing specification.",
    criterion: "Invented for the demo.",
    belowMinimumRule: "An example: whether one ball below the minimum fails the model on its own is the governing specification's to say.",
    dropsPerBall: "Three drops per ball is common practice.",
    guardBandS: "Invented for the demo.",
    roundSizes: "2, then 8 more, then 24 more is common practice for results close to the limit.",
    toleranceCoverage: "Invented for the demo.",
    toleranceConfidence: "Invented for the demo.",
    readingToleranceS: "Invented for the demo.",
    minAcclimationH: "At least a day in the test room is common practice.",
    surfaceTempMinC: "Invented for the demo.",
    surfaceTempMaxC: "Invented for the demo.",
    roughnessMaxSdUm: "Invented for the demo.",
  },
  notes: "Every value here is an example. The governing specification and the lab's own accredited procedure decide.",
};

export const SECOND_ORGANISATION = "Brindlecombe Spheres (invented)";

interface DemoSubmission {
  reference: string;
  org: string;
  model: string;
  kind: "approval" | "surveillance";
  round: number;
  status: string;
  receivedOn: string;
  approval?: string;
  /** `acclimatedH`: hours from acclimation start to the demo run; null for no run yet. */
  samples: { serial: string; weightG: number; round: number; acclimatedH: number | null }[];
}

const sample = (serial: string, weightG: number, round = 1, acclimatedH: number | null = null) => ({ serial, weightG, round, acclimatedH });

const SUBMISSIONS: DemoSubmission[] = [
  {
    reference: "D-2026-0001",
    org: "Tallowby Ball Works (invented)",
    model: "Quarry Comet (invented)",
    kind: "approval",
    round: 1,
    status: "testing",
    receivedOn: "2026-11-02",
    samples: [sample("QC-1001", 7257.48, 1, 30), sample("QC-1002", 7241.9, 1, 30)],
  },
  {
    reference: "D-2026-0002",
    org: "Tallowby Ball Works (invented)",
    model: "Hollow Lantern (invented)",
    kind: "approval",
    round: 2,
    status: "testing",
    receivedOn: "2026-10-12",
    samples: [
      sample("HL-2001", 6803.89, 1, 28),
      sample("HL-2002", 6795.2, 1, 28),
      // Every ball has its run. The first round-2 ball was tested after only 14 h in the room: the
      // demo's condition warning; the others after a day or more.
      ...Array.from({ length: 8 }, (_, i) => sample(`HL-21${String(i + 1).padStart(2, "0")}`, 6790 + i * 3.5, 2, i === 0 ? 14 : 25 + i)),
    ],
  },
  {
    reference: "D-2026-0003",
    org: SECOND_ORGANISATION,
    model: "Marsh Ember (invented)",
    kind: "approval",
    round: 1,
    status: "received",
    receivedOn: "2026-11-20",
    samples: [sample("ME-0301", 6350.29), sample("ME-0302", 6361.0)],
  },
  {
    reference: "D-2026-0004",
    org: "Tallowby Ball Works (invented)",
    model: "Quarry Comet (invented)",
    kind: "surveillance",
    round: 1,
    status: "received",
    receivedOn: "2026-11-25",
    approval: "D-2026-0001",
    samples: [sample("QC-S-01", 7250.1)],
  },
];

export async function seedIntake(knex: Knex): Promise<void> {
  await knex("organisations")
    .insert({ name: SECOND_ORGANISATION, contact_emails: ["results@brindlecombe.test"] })
    .onConflict(knex.raw("(lower(name))"))
    .ignore();
  await knex("organisations")
    .whereRaw("lower(name) = lower(?)", ["Tallowby Ball Works (invented)"])
    .update({ contact_emails: ["approvals@tallowby.test"] });
  await knex("specification_editions")
    .insert({ ...DEMO_EDITION, sources: JSON.stringify(DEMO_EDITION.sources) })
    .onConflict(knex.raw("(lower(name))"))
    .ignore();
  const edition = await knex("specification_editions").whereRaw("lower(name) = lower(?)", [DEMO_EDITION.name]).first("id");
  const technician = await knex("users").where({ email: "technician@marrowfield.test" }).first("id");

  for (const s of SUBMISSIONS) {
    const existing = await knex("submissions").where({ reference: s.reference }).first("id");
    if (existing) {
      // An older demo database: add only the runs of demo samples that have none yet.
      await addMissingRuns(knex, existing.id, s, technician.id);
      continue;
    }
    const org = await knex("organisations").whereRaw("lower(name) = lower(?)", [s.org]).first("id");
    const approval = s.approval ? await knex("submissions").where({ reference: s.approval }).first("id") : null;
    const [{ id }] = await knex("submissions")
      .insert({
        reference: s.reference,
        organisation_id: org.id,
        model_name: s.model,
        kind: s.kind,
        weight_classes_lb: [14, 15, 16],
        received_on: s.receivedOn,
        edition_id: edition.id,
        status: s.status,
        current_round: s.round,
        approval_submission_id: approval?.id ?? null,
      })
      .returning("id");
    for (const x of s.samples) {
      const receivedAt = new Date(`${s.receivedOn}T09:00:00Z`);
      const [{ id: sampleId }] = await knex("samples")
        .insert({ submission_id: id, serial: x.serial, weight_g: x.weightG, round: x.round, received_at: receivedAt, acclimation_started_at: receivedAt })
        .returning("id");
      if (x.acclimatedH !== null) await insertDemoRun(knex, sampleId, receivedAt, x.acclimatedH, technician.id);
    }
  }
  // Later references continue after the demo ones.
  await knex.raw("select setval('submission_reference_seq', greatest((select last_value from submission_reference_seq), 10))");
}

async function insertDemoRun(knex: Knex, sampleId: string, acclimationStart: Date, acclimatedH: number, technicianId: string): Promise<void> {
  const testedAt = new Date(acclimationStart.getTime() + acclimatedH * 3_600_000);
  const [{ id: runId }] = await knex("runs")
    .insert({
      sample_id: sampleId,
      tested_at: testedAt,
      technician_id: technicianId,
      room_temp_c: 22.5,
      surface_temp_c: 22.1,
      prep_method: "Demo preparation: wiped, abraded, wiped (invented)",
      prep_abrasive: "Demo pad 500",
      prep_pad_position: "cycle 3 of 10",
      roughness_ra_um: [0.42, 0.45, 0.44],
      oil_lot: "DEMO-OIL-7",
      dispenser_check_value: 12.1,
      dispenser_check_unit: "mg",
      camera_id: "CAM-A",
    })
    .returning("id");
  await knex("drops").insert([1, 2, 3].map((ordinal) => ({ run_id: runId, ordinal })));
}

async function addMissingRuns(knex: Knex, submissionId: string, s: DemoSubmission, technicianId: string): Promise<void> {
  for (const x of s.samples) {
    if (x.acclimatedH === null) continue;
    const row = await knex("samples as x")
      .where({ "x.submission_id": submissionId, "x.serial": x.serial })
      .first("x.id", "x.acclimation_started_at", knex.raw("exists (select 1 from runs r where r.sample_id = x.id) as has_run"));
    if (row && !row.has_run && row.acclimation_started_at) await insertDemoRun(knex, row.id, new Date(row.acclimation_started_at), x.acclimatedH, technicianId);
  }
}
