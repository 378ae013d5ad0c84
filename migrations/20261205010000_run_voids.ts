import type { Knex } from "knex";

// A lead voids a run that must not count (recorded on the wrong ball, a botched test), with a
// reason; the run and its drops stay on record. A void is final: a new run is recorded instead.
export async function up(knex: Knex): Promise<void> {
  await knex.raw(`
    alter table runs
      add column voided_by uuid references users(id),
      add column voided_at timestamptz,
      add column void_reason text,
      add constraint runs_void check ((voided_by is null) = (voided_at is null) and (voided_at is null) = (void_reason is null)),
      add constraint runs_void_reason check (void_reason is null or length(btrim(void_reason)) >= 10);
    create function runs_void_is_final() returns trigger language plpgsql as $$
    begin
      if old.voided_at is not null and (new.voided_at is distinct from old.voided_at or new.voided_by is distinct from old.voided_by or new.void_reason is distinct from old.void_reason) then
        raise exception 'a voided run stays voided' using errcode = 'check_violation';
      end if;
      return new;
    end $$;
    create trigger runs_void_final before update on runs for each row execute function runs_void_is_final();
  `);
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw(`
    drop trigger runs_void_final on runs;
    drop function runs_void_is_final();
    alter table runs drop column voided_by, drop column voided_at, drop column void_reason;
  `);
}
