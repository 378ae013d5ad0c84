import type { Knex } from "knex";

// A clip trimmed in the browser before upload keeps where it came from: the original's name and
// start time, and the window asked for. What was really kept is read from the clip's frame index.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("clips", (t) => {
    t.jsonb("trim");
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable("clips", (t) => {
    t.dropColumn("trim");
  });
}
