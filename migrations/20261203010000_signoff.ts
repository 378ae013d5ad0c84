import type { Knex } from "knex";

// Sign-off: a lead's signature releases a submission's results at one revision and locks its
// records; re-opening records why and starts the next revision. Both tables only grow.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("signatures", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("submission_id").notNullable().references("submissions.id");
    t.integer("revision").notNullable();
    t.uuid("signed_by").notNullable().references("users.id");
    t.timestamp("signed_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.text("meaning").notNullable().defaultTo("results reviewed and released");
    t.jsonb("results").notNullable();
    t.jsonb("changes");
    t.unique(["submission_id", "revision"]);
  });
  await knex.schema.createTable("reopenings", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("submission_id").notNullable().references("submissions.id");
    /** The revision this re-opening starts. */
    t.integer("revision").notNullable();
    t.text("reason").notNullable();
    t.uuid("reopened_by").notNullable().references("users.id");
    t.timestamp("reopened_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(["submission_id", "revision"]);
  });
  await knex.raw(`
    alter table reopenings add constraint reopenings_reason check (length(btrim(reason)) >= 10);
    alter table signatures add constraint signatures_revision check (revision >= 1);
    alter table reopenings add constraint reopenings_revision check (revision >= 2);
    create function signoff_rows_are_final() returns trigger language plpgsql as $$
    begin
      raise exception 'signatures and re-openings are kept as recorded' using errcode = 'check_violation';
    end $$;
    create trigger signatures_final before update or delete on signatures for each row execute function signoff_rows_are_final();
    create trigger reopenings_final before update or delete on reopenings for each row execute function signoff_rows_are_final();
  `);
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw("drop table signatures; drop table reopenings; drop function signoff_rows_are_final()");
}
