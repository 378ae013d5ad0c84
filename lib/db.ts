import "server-only";
import knex, { type Knex } from "knex";
import { env } from "./env";

export type Db = Knex | Knex.Transaction;

const holder = globalThis as unknown as { __wickmarkDb?: Knex };

/** One pool per process, kept on globalThis so dev hot reload does not open a new one each time. */
export function db(): Knex {
  if (!holder.__wickmarkDb) {
    holder.__wickmarkDb = knex({
      client: "pg",
      connection: env().DATABASE_URL,
      pool: { min: 0, max: env().DATABASE_POOL_MAX },
    });
  }
  return holder.__wickmarkDb;
}

export async function closeDb(): Promise<void> {
  await holder.__wickmarkDb?.destroy();
  holder.__wickmarkDb = undefined;
}

/** PostgreSQL's code for a unique violation; the data layer turns it into a conflict. */
export function isUniqueViolation(err: unknown): boolean {
  return typeof err === "object" && err !== null && (err as { code?: string }).code === "23505";
}

/** A round trip to the database, for health checks. */
export async function pingDb(q: Db): Promise<void> {
  await q.raw("select 1");
}
