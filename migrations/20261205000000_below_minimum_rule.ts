import type { Knex } from "knex";

// Whether a ball below the minimum fails the submission on its own ("fails", the default) or is
// reported while the rounds and the tolerance limit decide ("reported"): the edition's choice.
export async function up(knex: Knex): Promise<void> {
  await knex.raw(`alter table specification_editions add column below_minimum_rule text not null default 'fails'
    constraint specification_editions_below_minimum_rule check (below_minimum_rule in ('fails', 'reported'))`);
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw("alter table specification_editions drop column below_minimum_rule");
}
