import type { Knex } from "knex";
import { env } from "./lib/env";

// For the knex CLI: `tsx node_modules/knex/bin/cli.js migrate:latest --knexfile knexfile.ts`.
const config: Knex.Config = {
  client: "pg",
  connection: env().DATABASE_URL,
  migrations: { directory: "./migrations", extension: "ts", loadExtensions: [".ts"] },
  seeds: { directory: "./seeds", extension: "ts", loadExtensions: [".ts"] },
};

export default config;
