import type { Knex } from "knex";

// Rulings: a lead settles a drop whose two readings disagree, by accepting one of them or by a
// third reading of their own (a reading in slot 3), always with a reason. One ruling per drop; the
// original readings stay as they were.
export async function up(knex: Knex): Promise<void> {
  await knex.raw(`
    alter table readings drop constraint readings_slot;
    alter table readings add constraint readings_slot check (slot in (1, 2, 3));
  `);
  await knex.schema.createTable("rulings", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("drop_id").notNullable().unique().references("drops.id");
    t.text("chosen").notNullable();
    t.uuid("reading_id").notNullable().references("readings.id");
    t.double("time_s").notNullable();
    t.text("reason").notNullable();
    t.uuid("ruled_by").notNullable().references("users.id");
    t.timestamp("ruled_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
  await knex.raw(`
    alter table rulings
      add constraint rulings_chosen check (chosen in ('first', 'second', 'third')),
      add constraint rulings_reason check (length(btrim(reason)) >= 10);
  `);
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable("rulings");
  await knex.raw(`
    delete from readings where slot = 3 and status = 'draft';
    alter table readings drop constraint readings_slot;
    alter table readings add constraint readings_slot check (slot in (1, 2));
  `);
}
