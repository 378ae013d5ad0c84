import { spawn, type ChildProcess } from "node:child_process";
import fs from "node:fs";
import path from "node:path";
import { type Service, assertAlive, httpAnswers, logHasSince, logSize, projectRoot, SERVER_TS_ARGS, spawnLogged, stopChild, waitFor } from "./services/service";

const NEXT_BIN = path.join(projectRoot, "node_modules", "next", "dist", "bin", "next");
const BUILD_INPUTS = [
  "app",
  "components",
  "lib",
  "public",
  "proxy.ts",
  "next.config.ts",
  "tailwind.config.ts",
  "postcss.config.mjs",
  "package-lock.json",
  "tsconfig.json",
];

function newestMtime(p: string): number {
  if (!fs.existsSync(p)) return 0;
  const st = fs.statSync(p);
  if (!st.isDirectory()) return st.mtimeMs;
  return fs.readdirSync(p).reduce((m, name) => Math.max(m, newestMtime(path.join(p, name))), st.mtimeMs);
}

/** Builds the app unless the build in `distDir` is newer than every input. */
export async function buildApp(env: Record<string, string>, distDir: string, log: (s: string) => void): Promise<void> {
  const stamp = path.join(projectRoot, distDir, "BUILD_ID");
  const built = fs.existsSync(stamp) ? fs.statSync(stamp).mtimeMs : 0;
  const inputs = Math.max(...BUILD_INPUTS.map((p) => newestMtime(path.join(projectRoot, p))));
  if (built > inputs) return log(`build in ${distDir} is up to date`);
  log(`building the app into ${distDir} …`);
  const t0 = Date.now();
  const code = await new Promise<number>((resolve) => {
    const child = spawn(process.execPath, [NEXT_BIN, "build"], { cwd: projectRoot, env: { ...process.env, ...env }, stdio: ["ignore", "inherit", "inherit"] });
    child.on("exit", (c) => resolve(c ?? 1));
  });
  if (code !== 0) throw new Error(`next build failed (exit ${code})`);
  log(`built in ${((Date.now() - t0) / 1000).toFixed(1)} s`);
}

/** `next start` (or `next dev`) on 127.0.0.1, ready when /api/health answers. */
export async function startNext(env: Record<string, string>, port: number, mode: "start" | "dev", logFile: string): Promise<Service> {
  const child = spawnLogged("next", process.execPath, [NEXT_BIN, mode, "-H", "127.0.0.1", "-p", String(port)], { logFile, env: { ...process.env, ...env } });
  const stop = () => stopChild(child, 8000);
  try {
    await waitFor(
      async () => {
        assertAlive(child, "next", logFile);
        return httpAnswers(`http://127.0.0.1:${port}/api/health`);
      },
      mode === "dev" ? 120_000 : 30_000,
      `the app on port ${port} (log: ${logFile})`,
    );
  } catch (e) {
    await stop();
    throw e;
  }
  return { name: "app", stop };
}

/**
 * The background worker: a separate process on the same lib/. Like a service manager would, we
 * start it again if it dies; jobs it held are retried by pg-boss once they expire.
 */
export async function startWorker(env: Record<string, string>, logFile: string): Promise<Service> {
  let stopping = false;
  let child: ChildProcess;
  const launch = async () => {
    const offset = logSize(logFile);
    child = spawnLogged("worker", process.execPath, [...SERVER_TS_ARGS, path.join(projectRoot, "worker", "index.ts")], {
      logFile,
      env: { ...process.env, ...env },
    });
    child.once("exit", (code, signal) => {
      if (stopping) return;
      fs.appendFileSync(logFile, `--- worker exited (${signal ?? code}); starting it again\n`);
      setTimeout(() => void launch().catch((e) => console.error(`[wickmark] the worker did not restart: ${e}`)), 500);
    });
    await waitFor(
      async () => {
        assertAlive(child, "worker", logFile);
        return logHasSince(logFile, offset, "worker: consuming");
      },
      30_000,
      `the worker (log: ${logFile})`,
    );
  };
  const stop = async () => {
    stopping = true;
    await stopChild(child, 10_000);
  };
  try {
    await launch();
  } catch (e) {
    await stop();
    throw e;
  }
  return { name: "worker", stop };
}
