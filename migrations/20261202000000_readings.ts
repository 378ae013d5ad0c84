import type { Knex } from "knex";

// Readings: where each drop sits on a clip, the reviewers' marks, and the drop's state. A submitted
// reading is evidence: PostgreSQL itself refuses to change or delete it.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("drops", (t) => {
    t.uuid("clip_id").references("clips.id");
    t.integer("start_frame");
    t.uuid("placed_by").references("users.id");
    t.timestamp("placed_at", { useTz: true });
    t.text("state").notNullable().defaultTo("unread");
    t.timestamp("state_changed_at", { useTz: true });
    t.double("agreed_time_s");
    t.double("time_difference_s");
    t.double("dispense_difference_s");
    t.double("clear_difference_s");
    t.index(["clip_id"]);
    t.index(["state"]);
  });
  await knex.raw(`
    alter table drops
      add constraint drops_state check (state in ('unread', 'read once', 'agreed', 'discrepancy', 'ruled', 'signed off')),
      add constraint drops_placement check ((clip_id is null) = (start_frame is null) and (start_frame is null or start_frame >= 0))
  `);

  await knex.schema.createTable("readings", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("drop_id").notNullable().references("drops.id");
    t.uuid("clip_id").notNullable().references("clips.id");
    t.uuid("reviewer_id").notNullable().references("users.id");
    // 1 = the first reader's, 2 = the second reader's; a correction keeps its reader's slot.
    t.smallint("slot").notNullable();
    t.text("status").notNullable().defaultTo("draft");
    t.integer("dispense_frame");
    t.integer("clear_frame");
    // Timestamps in the clip's time base: the drop time is their difference, exactly.
    t.bigInteger("dispense_pts");
    t.bigInteger("clear_pts");
    t.double("time_s");
    t.double("uncertainty_standard_s");
    t.double("uncertainty_expanded_s");
    t.uuid("supersedes_id").unique().references("readings.id");
    t.text("correction_reason");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("updated_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("submitted_at", { useTz: true });
    t.index(["drop_id"]);
    t.index(["reviewer_id", "status"]);
  });
  await knex.raw(`
    alter table readings
      add constraint readings_status check (status in ('draft', 'submitted')),
      add constraint readings_slot check (slot in (1, 2)),
      add constraint readings_marks_in_order check (clear_frame is null or dispense_frame is null or clear_frame > dispense_frame),
      add constraint readings_submitted_complete check (status = 'draft' or (dispense_frame is not null and clear_frame is not null
        and time_s is not null and submitted_at is not null)),
      add constraint readings_correction_reason check ((supersedes_id is null) = (correction_reason is null));
    -- One reader per slot, and one slot per reader, counting the readings that start a chain.
    create unique index readings_one_reader_per_slot on readings (drop_id, slot) where supersedes_id is null;
    create unique index readings_one_slot_per_reader on readings (drop_id, reviewer_id) where supersedes_id is null;
    create unique index readings_one_draft on readings (drop_id, reviewer_id) where status = 'draft';

    create function readings_submitted_are_final() returns trigger language plpgsql as $$
    begin
      if old.status = 'submitted' then
        raise exception 'a submitted reading cannot be changed or deleted; record a correction instead'
          using errcode = 'check_violation';
      end if;
      return case when tg_op = 'DELETE' then old else new end;
    end $$;
    create trigger readings_final before update or delete on readings
      for each row execute function readings_submitted_are_final();
  `);
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw("drop table readings; drop function readings_submitted_are_final()");
  await knex.schema.alterTable("drops", (t) => {
    t.dropColumns(
      "clip_id",
      "start_frame",
      "placed_by",
      "placed_at",
      "state",
      "state_changed_at",
      "agreed_time_s",
      "time_difference_s",
      "dispense_difference_s",
      "clear_difference_s",
    );
  });
}
