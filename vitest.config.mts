import path from "node:path";
import { defineConfig } from "vitest/config";

// Projects in one run: `npm test` starts the services first and reads the totals of all of them.
// `server-only` resolves as in Next's server bundles (to its empty module): the tests run server code in node.
const alias = { "@": path.resolve(import.meta.dirname), "server-only": path.resolve(import.meta.dirname, "node_modules/server-only/empty.js") };
// Tests that kill the shared worker: the worker is one process for the whole run, so while it is
// down (and until the jobs it held expire) every other file's jobs and mails would wait on it. They
// run in a project of their own (groupOrder 1), one file at a time, once the unit and integration
// files (group 0) have finished; vitest runs the e2e files, one at a time, in a group after both. A second worker of their own would not do: both would consume the same queues, so
// nothing decides which of them takes the job the test means to interrupt.
const WORKER_KILLERS = ["tests/integration/worker-restart.test.ts"];

export default defineConfig({
  resolve: { alias },
  test: {
    projects: [
      { resolve: { alias }, test: { name: "unit", include: ["tests/unit/**/*.test.ts"], environment: "node" } },
      {
        resolve: { alias },
        test: {
          name: "integration",
          include: ["tests/integration/**/*.test.ts"],
          exclude: WORKER_KILLERS,
          environment: "node",
          testTimeout: 30_000,
          hookTimeout: 60_000,
        },
      },
      {
        resolve: { alias },
        test: {
          name: "e2e",
          include: ["tests/e2e/**/*.test.ts"],
          environment: "node",
          testTimeout: 60_000,
          hookTimeout: 60_000,
          fileParallelism: false,
        },
      },
      {
        resolve: { alias },
        test: {
          name: "integration-alone",
          include: WORKER_KILLERS,
          environment: "node",
          testTimeout: 30_000,
          hookTimeout: 60_000,
          fileParallelism: false,
          sequence: { groupOrder: 1 },
        },
      },
    ],
  },
});
