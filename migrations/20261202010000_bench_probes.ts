import type { Knex } from "knex";

// The benchmark's baseline: a route that does one insert here, compared with the real routes under
// the same load. Empty outside benchmark runs (the route answers only when BENCH_ROUTES is on).
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("bench_probes", (t) => {
    t.bigIncrements("id");
    t.uuid("actor_id").notNullable();
    t.timestamp("at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable("bench_probes");
}
