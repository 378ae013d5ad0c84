import { spawn } from "node:child_process";
import fs from "node:fs";
import path from "node:path";
import { buildApp, startNext, startWorker } from "./app";
import { migrateAndSeed } from "./database";
import { PROFILES } from "./profiles";
import { projectRoot, type Service } from "./services/service";
import { startStack } from "./stack";
import { countResults, totalsLine } from "./test-totals";

// `npm test`: fresh services on their own ports, the built app and the worker, then every test
// project in one vitest run. Ends with one line `tests: N passed, N failed, N skipped, N todo`; a run
// that did not succeed (vitest's exit code, nothing passed) never says "0 failed" (test-totals.ts).
const profile = PROFILES.test;
const log = (s: string) => console.log(`[test] ${s}`);
const VITEST = path.join(projectRoot, "node_modules", "vitest", "vitest.mjs");

async function main(): Promise<number> {
  const t0 = Date.now();
  fs.rmSync(profile.dataDir, { recursive: true, force: true });
  fs.rmSync(profile.pgFallbackDir, { recursive: true, force: true });
  fs.rmSync(path.join(projectRoot, "test-results"), { recursive: true, force: true });
  const running: Service[] = [];
  const report = path.join(profile.dataDir, "vitest.json");
  try {
    const stack = await startStack(profile, log);
    running.push(...stack.services);
    await migrateAndSeed(stack.env, log);
    await buildApp(stack.env, profile.distDir, log);
    const logs = path.join(profile.dataDir, "logs");
    running.push(await startWorker(stack.env, path.join(logs, "worker.log")));
    running.push(await startNext(stack.env, profile.ports.app, "start", path.join(logs, "app.log")));
    log(`ready in ${((Date.now() - t0) / 1000).toFixed(1)} s; running the tests`);

    // Files the tests make live in the test data folder, which the next run wipes.
    const tmp = path.join(profile.dataDir, "tmp");
    fs.mkdirSync(tmp, { recursive: true });
    const args = [VITEST, "run", "--reporter=default", "--reporter=json", `--outputFile.json=${report}`, ...process.argv.slice(2)];
    const code = await new Promise<number>((resolve) => {
      const child = spawn(process.execPath, args, { cwd: projectRoot, env: { ...process.env, ...stack.env, TEST_TMP_DIR: tmp }, stdio: "inherit" });
      child.on("exit", (c) => resolve(c ?? 1));
    });
    const totals = countResults(report, code);
    log(`finished in ${((Date.now() - t0) / 1000).toFixed(1)} s; logs in ${path.relative(projectRoot, logs)}, screenshots in test-results/`);
    console.log(totalsLine(totals));
    return code === 0 && totals.failed === 0 ? 0 : 1;
  } catch (err) {
    console.error(`[test] ${err instanceof Error ? err.message : err}`);
    console.log(totalsLine({ passed: 0, failed: 1, skipped: 0, todo: 0 }));
    return 1;
  } finally {
    for (const s of running.reverse()) await s.stop().catch(() => {});
  }
}

main().then((code) => process.exit(code));
