import type { Knex } from "knex";

// Intake: organisations' contacts, specification editions, submissions, samples, runs and drops.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("organisations", (t) => {
    t.specificType("contact_emails", "text[]").notNullable().defaultTo("{}");
  });

  await knex.schema.createTable("specification_editions", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.text("name").notNullable();
    t.date("effective_from").notNullable();
    t.double("min_absorption_s").notNullable();
    t.text("criterion").notNullable();
    t.integer("drops_per_ball").notNullable();
    t.double("guard_band_s").notNullable();
    t.specificType("round_sizes", "integer[]").notNullable();
    t.double("tolerance_coverage").notNullable();
    t.double("tolerance_confidence").notNullable();
    t.double("reading_tolerance_s").notNullable();
    t.double("min_acclimation_h").notNullable();
    t.double("surface_temp_min_c").notNullable();
    t.double("surface_temp_max_c").notNullable();
    t.double("roughness_max_sd_um").notNullable();
    t.jsonb("sources").notNullable().defaultTo("{}");
    t.text("notes").notNullable().defaultTo("");
    t.uuid("based_on_id").references("specification_editions.id");
    t.uuid("created_by").references("users.id");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
  await knex.raw(`
    create unique index specification_editions_name_key on specification_editions (lower(name));
    alter table specification_editions
      add constraint editions_criterion check (criterion in ('ball_mean', 'every_drop')),
      add constraint editions_positive check (min_absorption_s > 0 and guard_band_s >= 0 and reading_tolerance_s >= 0
        and min_acclimation_h >= 0 and roughness_max_sd_um >= 0 and drops_per_ball between 1 and 10),
      add constraint editions_probabilities check (tolerance_coverage > 0 and tolerance_coverage < 1
        and tolerance_confidence > 0 and tolerance_confidence < 1),
      add constraint editions_window check (surface_temp_min_c < surface_temp_max_c),
      add constraint editions_rounds check (cardinality(round_sizes) between 1 and 10 and 0 < all(round_sizes));
  `);

  await knex.raw("create sequence submission_reference_seq");
  await knex.schema.createTable("submissions", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.text("reference").notNullable().unique();
    t.uuid("organisation_id").notNullable().references("organisations.id");
    t.text("model_name").notNullable();
    t.text("kind").notNullable();
    t.specificType("weight_classes_lb", "integer[]").notNullable().defaultTo("{}");
    t.date("received_on").notNullable();
    t.uuid("edition_id").notNullable().references("specification_editions.id");
    t.text("status").notNullable().defaultTo("received");
    t.integer("current_round").notNullable().defaultTo(1);
    t.uuid("approval_submission_id").references("submissions.id");
    t.text("notes").notNullable().defaultTo("");
    t.uuid("created_by").references("users.id");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("updated_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["organisation_id"]);
    t.index(["received_on"]);
  });
  await knex.raw(`
    alter table submissions
      add constraint submissions_kind check (kind in ('approval', 'surveillance', 'research')),
      add constraint submissions_status check (status in ('received', 'testing', 'awaiting_samples', 'decided', 'released')),
      add constraint submissions_round check (current_round >= 1),
      add constraint submissions_surveillance_link check ((kind = 'surveillance') = (approval_submission_id is not null));
  `);

  await knex.schema.createTable("samples", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("submission_id").notNullable().references("submissions.id");
    t.text("serial").notNullable();
    t.double("weight_g").notNullable();
    t.integer("round").notNullable();
    t.timestamp("received_at", { useTz: true }).notNullable();
    t.timestamp("acclimation_started_at", { useTz: true });
    t.text("notes").notNullable().defaultTo("");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
  await knex.raw("create unique index samples_serial_key on samples (submission_id, lower(serial))");
  await knex.raw(
    "alter table samples add constraint samples_weight check (weight_g > 0 and weight_g < 20000), add constraint samples_round check (round >= 1)",
  );

  await knex.schema.createTable("runs", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("sample_id").notNullable().references("samples.id");
    t.timestamp("tested_at", { useTz: true }).notNullable();
    t.uuid("technician_id").notNullable().references("users.id");
    t.double("room_temp_c").notNullable();
    t.double("surface_temp_c").notNullable();
    t.text("prep_method").notNullable();
    t.text("prep_abrasive").notNullable().defaultTo("");
    t.text("prep_pad_position").notNullable().defaultTo("");
    t.text("prep_notes").notNullable().defaultTo("");
    t.specificType("roughness_ra_um", "double precision[]").notNullable().defaultTo("{}");
    t.text("oil_lot").notNullable();
    t.double("dispenser_check_value");
    t.text("dispenser_check_unit");
    t.text("camera_id").notNullable().defaultTo("");
    t.text("notes").notNullable().defaultTo("");
    t.uuid("accepted_by").references("users.id");
    t.timestamp("accepted_at", { useTz: true });
    t.text("accept_reason");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("updated_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["sample_id"]);
  });
  await knex.raw(`
    alter table runs
      add constraint runs_dispenser_unit check (dispenser_check_unit is null or dispenser_check_unit in ('mg', 'uL')),
      add constraint runs_acceptance check ((accepted_by is null) = (accepted_at is null) and (accepted_at is null) = (accept_reason is null));
  `);

  await knex.schema.createTable("drops", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("run_id").notNullable().references("runs.id");
    t.integer("ordinal").notNullable();
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(["run_id", "ordinal"]);
  });
  await knex.raw("alter table drops add constraint drops_ordinal check (ordinal between 1 and 10)");

  // An edition in use is evidence of what a submission was judged against: it never changes.
  await knex.raw(`
    create function editions_refuse_change_in_use() returns trigger language plpgsql as $$
    begin
      if exists (select 1 from submissions where edition_id = old.id) then
        raise exception 'specification edition % is used by a submission and cannot be changed; create a new edition', old.name
          using errcode = 'check_violation', constraint = 'editions_immutable_in_use';
      end if;
      return case when tg_op = 'DELETE' then old else new end;
    end $$;
    create trigger editions_immutable_in_use before update or delete on specification_editions
      for each row execute function editions_refuse_change_in_use();
  `);
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw("drop table if exists drops, runs, samples, submissions, specification_editions cascade");
  await knex.raw("drop sequence if exists submission_reference_seq");
  await knex.raw("drop function if exists editions_refuse_change_in_use()");
  await knex.schema.alterTable("organisations", (t) => t.dropColumn("contact_emails"));
}
