import os from "node:os";
import path from "node:path";
import { projectRoot } from "./services/service";

// The two local set-ups: `npm start`/`npm run dev` keep their data; `npm test` starts afresh on
// other ports and another bucket, so both can run on one machine at once.
export interface Profile {
  name: "dev" | "test";
  dataDir: string;
  /** Where PostgreSQL keeps its files when the project folder is not traversable by nobody. */
  pgFallbackDir: string;
  ports: { app: number; pg: number; s3: number; smtp: number; mailApi: number };
  bucket: string;
  database: string;
  fast: boolean;
  distDir: string;
  bcryptRounds: number;
  /** Settings of lib/env.ts that differ from their defaults in this profile. */
  env: Record<string, string>;
}

const dataRoot = path.join(projectRoot, ".data");
// WICKMARK_PORT_OFFSET moves every port of both profiles, so two checkouts can run side by side.
const offset = Number(process.env.WICKMARK_PORT_OFFSET ?? 0) || 0;
const ports = (p: Profile["ports"]): Profile["ports"] => Object.fromEntries(Object.entries(p).map(([k, v]) => [k, v + offset])) as Profile["ports"];
const tmpKey = Buffer.from(projectRoot).toString("base64url").slice(-12);

export const PROFILES: Record<Profile["name"], Profile> = {
  dev: {
    name: "dev",
    dataDir: path.join(dataRoot, "dev"),
    pgFallbackDir: path.join(os.tmpdir(), `wickmark-${tmpKey}`, "dev-pg"),
    ports: ports({ app: 3000, pg: 54329, s3: 4569, smtp: 2525, mailApi: 2580 }),
    bucket: "wickmark",
    database: "wickmark",
    fast: false,
    distDir: ".next",
    bcryptRounds: 12,
    env: {},
  },
  test: {
    name: "test",
    dataDir: path.join(dataRoot, "test"),
    pgFallbackDir: path.join(os.tmpdir(), `wickmark-${tmpKey}`, "test-pg"),
    ports: ports({ app: 3100, pg: 54339, s3: 4579, smtp: 2535, mailApi: 2590 }),
    bucket: "wickmark-test",
    database: "wickmark_test",
    fast: true,
    distDir: ".next-test",
    // Fewer rounds keep the many sign-ins of the suite quick; production keeps the default.
    bcryptRounds: 10,
    // Small parts so a test file spans several; quick expiry so a killed worker's job returns soon.
    env: {
      CLIP_PART_SIZE_MB: "5",
      JOB_EXPIRE_SECONDS: "20",
      JOB_MAINTENANCE_SECONDS: "2",
      OUTBOX_SWEEP_SECONDS: "2",
      OUTBOX_LEASE_SECONDS: "10",
      OUTBOX_RETRY_BASE_SECONDS: "1",
      REVIEWER_DIGEST_EVERY_SECONDS: "3",
    },
  },
};
