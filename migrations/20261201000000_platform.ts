import type { Knex } from "knex";

// Users, invitations, sign-in attempts and the append-only audit log.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("organisations", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.text("name").notNullable();
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
  await knex.raw("create unique index organisations_name_key on organisations (lower(name))");

  await knex.schema.createTable("users", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.text("email").notNullable();
    t.text("name").notNullable();
    t.text("password_hash");
    t.specificType("roles", "text[]").notNullable();
    t.uuid("organisation_id").references("organisations.id");
    t.boolean("active").notNullable().defaultTo(true);
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("updated_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
  await knex.raw(`
    create unique index users_email_key on users (lower(email));
    alter table users
      add constraint users_email_lower check (email = lower(email)),
      add constraint users_roles_known check (roles <@ array['technician','reviewer','lead','manufacturer']::text[] and cardinality(roles) > 0),
      add constraint users_manufacturer_org check (('manufacturer' = any(roles)) = (organisation_id is not null)),
      add constraint users_name_length check (char_length(name) between 1 and 120);
  `);

  await knex.schema.createTable("invites", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("user_id").notNullable().references("users.id");
    t.text("token_hash").notNullable().unique();
    t.uuid("created_by").references("users.id");
    t.timestamp("expires_at", { useTz: true }).notNullable();
    t.timestamp("used_at", { useTz: true });
    t.timestamp("revoked_at", { useTz: true });
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["user_id"]);
  });

  await knex.schema.createTable("sign_in_attempts", (t) => {
    t.bigIncrements("id");
    t.text("email").notNullable();
    t.text("address").notNullable();
    t.boolean("succeeded").notNullable();
    t.timestamp("at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["email", "at"]);
    t.index(["address", "at"]);
  });

  await knex.schema.createTable("audit_events", (t) => {
    t.bigIncrements("id");
    t.uuid("actor_id").references("users.id");
    t.text("action").notNullable();
    t.text("entity").notNullable();
    t.text("entity_id");
    t.jsonb("before");
    t.jsonb("after");
    t.text("request_id");
    t.timestamp("at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["entity", "entity_id"]);
    t.index(["at"]);
  });
  // Evidence: the database itself refuses to change or remove an audit row, whoever asks.
  await knex.raw(`
    create function audit_events_refuse_change() returns trigger language plpgsql as $$
    begin
      raise exception 'audit_events is append-only: % is refused', tg_op using errcode = 'insufficient_privilege';
    end $$;
    create trigger audit_events_no_update_delete before update or delete on audit_events
      for each row execute function audit_events_refuse_change();
    create trigger audit_events_no_truncate before truncate on audit_events
      for each statement execute function audit_events_refuse_change();
  `);
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw("drop table if exists audit_events, sign_in_attempts, invites, users, organisations cascade");
  await knex.raw("drop function if exists audit_events_refuse_change()");
}
