import type { Knex } from "knex";

// Clips: the original recording (evidence, never overwritten), its multipart upload, the state of
// each processing step, and what the server learns from it (probe, frame index, proxy, thumbnails).
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("clips", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("run_id").notNullable().references("runs.id");
    t.text("original_name").notNullable();
    t.text("declared_type").notNullable().defaultTo("");
    t.bigInteger("declared_size").notNullable();
    t.bigInteger("stored_size");
    t.text("object_key").notNullable().unique();
    t.text("status").notNullable().defaultTo("uploading");
    t.text("reject_reason");
    t.text("sha256");
    t.uuid("duplicate_of").references("clips.id");
    t.jsonb("probe");
    t.uuid("uploaded_by").notNullable().references("users.id");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("uploaded_at", { useTz: true });
    t.timestamp("ready_at", { useTz: true });
    t.index(["run_id"]);
    t.index(["sha256"]);
  });
  await knex.raw(`alter table clips add constraint clips_status check (status in ('uploading', 'processing', 'ready', 'rejected', 'failed'))`);

  await knex.schema.createTable("clip_uploads", (t) => {
    t.uuid("clip_id").primary().references("clips.id");
    t.text("upload_id").notNullable();
    t.integer("part_size").notNullable();
    t.integer("part_count").notNullable();
    t.timestamp("completed_at", { useTz: true });
  });

  await knex.schema.createTable("clip_upload_parts", (t) => {
    t.uuid("clip_id").notNullable().references("clips.id");
    t.integer("part_number").notNullable();
    t.text("etag").notNullable();
    t.bigInteger("size").notNullable();
    t.timestamp("recorded_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.primary(["clip_id", "part_number"]);
  });

  await knex.schema.createTable("clip_steps", (t) => {
    t.uuid("clip_id").notNullable().references("clips.id");
    t.text("step").notNullable();
    t.text("state").notNullable().defaultTo("pending");
    t.integer("attempts").notNullable().defaultTo(0);
    t.text("reason");
    t.jsonb("detail");
    t.timestamp("started_at", { useTz: true });
    t.timestamp("finished_at", { useTz: true });
    t.primary(["clip_id", "step"]);
  });
  await knex.raw(`
    alter table clip_steps
      add constraint clip_steps_step check (step in ('verify', 'hash', 'index', 'proxy', 'thumbnails')),
      add constraint clip_steps_state check (state in ('pending', 'running', 'retrying', 'done', 'skipped', 'failed'));
  `);

  await knex.schema.createTable("frame_indexes", (t) => {
    t.uuid("clip_id").primary().references("clips.id");
    t.integer("time_base_num").notNullable();
    t.integer("time_base_den").notNullable();
    t.integer("frame_count").notNullable();
    t.bigInteger("first_pts").notNullable();
    t.bigInteger("last_pts").notNullable();
    t.text("nominal_rate");
    t.double("average_rate").notNullable();
    t.boolean("variable_rate").notNullable();
    t.specificType("keyframes", "integer[]").notNullable();
    t.double("max_keyframe_interval_s").notNullable();
    t.integer("width").notNullable();
    t.integer("height").notNullable();
    t.integer("rotation").notNullable().defaultTo(0);
    t.text("codec").notNullable();
    t.boolean("has_b_frames").notNullable();
    // Presentation timestamps in display order, int64 little-endian: exact, and compact.
    t.binary("pts").notNullable();
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });

  await knex.schema.createTable("clip_renditions", (t) => {
    t.uuid("clip_id").primary().references("clips.id");
    t.text("proxy_key");
    t.text("proxy_reason").notNullable();
    t.bigInteger("proxy_offset_pts");
    t.text("poster_key");
    t.text("filmstrip_key");
    t.integer("filmstrip_tiles");
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw("drop table if exists clip_renditions, frame_indexes, clip_steps, clip_upload_parts, clip_uploads, clips cascade");
}
