import path from "node:path";
import type { Knex } from "knex";
import { seed } from "../seeds/demo";

const root = path.resolve(import.meta.dirname, "..");

/** Brings the schema to the latest migration; returns the names applied now. */
export async function migrateLatest(knex: Knex): Promise<string[]> {
  const [, applied] = await knex.migrate.latest({ directory: path.join(root, "migrations"), loadExtensions: [".ts"] });
  return applied as string[];
}

export async function seedDemo(knex: Knex): Promise<void> {
  await seed(knex);
}
