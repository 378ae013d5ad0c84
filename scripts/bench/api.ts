import fs from "node:fs";
import path from "node:path";
import { buildApp, startNext, startWorker } from "../app";
import { migrateAndSeed } from "../database";
import { PROFILES } from "../profiles";
import { projectRoot, type Service } from "../services/service";
import { startStack } from "../stack";
import { latencySummary, type LatencySummary } from "./latency";

// Reading-submit API under load: C connections, each a different reviewer correcting and
// re-submitting its own drop in a closed loop; the submit is timed. The baseline is a route that
// does one insert behind the same wrapper and session lookup, under the same loop. Phases alternate,
// so a neighbour's load falls on both sides alike. Uses the test profile's ports: not while `npm test` runs.
const log = (s: string) => console.log(`[bench:api] ${s}`);

export interface ApiBenchResult {
  connections: number;
  perPhase: number;
  submit: LatencySummary;
  baseline: LatencySummary;
  /** Median over the rounds of (submit p95 ÷ baseline p95 of the same round). */
  ratioP95: number;
  roundRatios: number[];
}

export async function benchApi(o: { connections: number; perConnection: number; rounds: number }): Promise<ApiBenchResult> {
  const profile = { ...PROFILES.test, dataDir: path.join(projectRoot, ".data", "bench-api") };
  fs.rmSync(profile.dataDir, { recursive: true, force: true });
  fs.rmSync(profile.pgFallbackDir, { recursive: true, force: true });
  const running: Service[] = [];
  try {
    const stack = await startStack(profile, log);
    running.push(...stack.services);
    const env = { ...stack.env, BENCH_ROUTES: "true" };
    Object.assign(process.env, env);
    await migrateAndSeed(env, log);
    await buildApp(env, profile.distDir, log);
    const logs = path.join(profile.dataDir, "logs");
    running.push(await startWorker(env, path.join(logs, "worker.log")));
    running.push(await startNext(env, profile.ports.app, "start", path.join(logs, "app.log")));
    const { prepareReaders } = await import("./api-setup");
    const readers = await prepareReaders(o.connections, log);
    const submit: number[][] = [];
    const baseline: number[][] = [];
    for (let round = 0; round < o.rounds; round++) {
      const phases = [
        async () =>
          baseline.push(
            await closedLoop(
              readers.map((r) => r.baselineStep),
              o.perConnection,
            ),
          ),
        async () =>
          submit.push(
            await closedLoop(
              readers.map((r) => r.submitStep),
              o.perConnection,
            ),
          ),
      ];
      if (round % 2) phases.reverse();
      for (const p of phases) await p();
      log(
        `round ${round + 1}: submit p95 ${latencySummary(submit.at(-1)!).p95.toFixed(1)} ms, baseline p95 ${latencySummary(baseline.at(-1)!).p95.toFixed(1)} ms`,
      );
    }
    const roundRatios = submit.map((xs, i) => latencySummary(xs).p95 / latencySummary(baseline[i]).p95);
    const ratioP95 = [...roundRatios].sort((x, y) => x - y)[Math.floor(roundRatios.length / 2)];
    return {
      connections: o.connections,
      perPhase: o.connections * o.perConnection,
      submit: latencySummary(submit.flat()),
      baseline: latencySummary(baseline.flat()),
      ratioP95,
      roundRatios,
    };
  } finally {
    // This process queued the clips' jobs and held connections: let go before the database stops.
    const [{ stopBoss }, { closeDb }] = await Promise.all([import("../../lib/jobs"), import("../../lib/db")]);
    await stopBoss().catch(() => {});
    await closeDb().catch(() => {});
    for (const s of running.reverse()) await s.stop().catch(() => {});
  }
}

/** Every connection runs its step `times` times, one after the other; all connections at once. */
async function closedLoop(steps: (() => Promise<number>)[], times: number): Promise<number[]> {
  const all = await Promise.all(
    steps.map(async (step) => {
      const out: number[] = [];
      for (let i = 0; i < times; i++) out.push(await step());
      return out;
    }),
  );
  return all.flat();
}
