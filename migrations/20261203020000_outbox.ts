import type { Knex } from "knex";

// Mail written in the same transaction as the event that causes it, delivered later by the worker;
// each person's switched-off kinds; balls already reported below the limit; requests for more samples.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("outbox", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.text("kind").notNullable();
    t.text("to_address").notNullable();
    t.uuid("user_id").references("users.id");
    t.text("subject").notNullable();
    t.text("text").notNullable();
    t.text("html").notNullable();
    t.text("status").notNullable().defaultTo("pending");
    t.integer("attempts").notNullable().defaultTo(0);
    t.text("last_error");
    t.text("dedupe_key");
    t.timestamp("next_attempt_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("claimed_at", { useTz: true });
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("sent_at", { useTz: true });
  });
  await knex.raw(`
    alter table outbox add constraint outbox_status_known check (status in ('pending','sending','sent','failed'));
    create unique index outbox_dedupe_key on outbox (dedupe_key) where dedupe_key is not null;
    create index outbox_due on outbox (next_attempt_at) where status <> 'sent';
    create index outbox_created on outbox (created_at desc);
    alter table users add column notification_opt_out text[] not null default '{}';
  `);

  await knex.schema.createTable("below_limit_reports", (t) => {
    t.uuid("submission_id").notNullable().references("submissions.id");
    t.uuid("sample_id").notNullable().references("samples.id");
    t.timestamp("reported_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.primary(["submission_id", "sample_id"]);
  });

  await knex.schema.createTable("sample_requests", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("submission_id").notNullable().references("submissions.id");
    t.integer("round").notNullable();
    t.integer("count").notNullable();
    t.text("weight").notNullable();
    t.date("due_by").notNullable();
    t.text("note").notNullable().defaultTo("");
    t.uuid("requested_by").notNullable().references("users.id");
    t.timestamp("requested_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.uuid("acknowledged_by").references("users.id");
    t.timestamp("acknowledged_at", { useTz: true });
    t.text("shipping_details");
    t.date("shipped_on");
    t.unique(["submission_id", "round"]);
  });
  await knex.raw("alter table sample_requests add constraint sample_requests_count_positive check (count between 1 and 1000)");
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable("sample_requests");
  await knex.schema.dropTable("below_limit_reports");
  await knex.raw("alter table users drop column notification_opt_out");
  await knex.schema.dropTable("outbox");
}
