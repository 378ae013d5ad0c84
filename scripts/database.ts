import knex from "knex";
import { migrateLatest, seedDemo } from "../db/migrate";

/** Applies migrations and the demo seed against the stack's database. */
export async function migrateAndSeed(env: Record<string, string>, log: (s: string) => void): Promise<void> {
  const k = knex({ client: "pg", connection: env.DATABASE_URL, pool: { min: 0, max: 2 } });
  try {
    const applied = await migrateLatest(k);
    log(applied.length ? `migrated: ${applied.join(", ")}` : "database schema is up to date");
    process.env.BCRYPT_ROUNDS = env.BCRYPT_ROUNDS;
    await seedDemo(k);
    log("demo data present");
  } finally {
    await k.destroy();
  }
}
