import { spawn, type ChildProcess } from "node:child_process";
import fs from "node:fs";
import net from "node:net";
import path from "node:path";
import { fileURLToPath, pathToFileURL } from "node:url";

export interface Service {
  name: string;
  stop(): Promise<void>;
}

/** Repository root, so children find node_modules wherever the caller's cwd is. */
export const projectRoot = fileURLToPath(new URL("../..", import.meta.url));

// How a node process runs our TypeScript server code (worker, mail fake, bench steps): through tsx,
// with the `react-server` condition so that `import "server-only"` resolves to its empty module,
// as it does in Next's server bundles (in a browser bundle it is a build error).
export const SERVER_TS_ARGS = [
  "--conditions=react-server",
  "--import",
  pathToFileURL(path.join(projectRoot, "node_modules", "tsx", "dist", "loader.mjs")).href,
];

export interface SpawnLoggedOptions {
  logFile: string;
  env?: NodeJS.ProcessEnv;
  cwd?: string;
  /** Signal the child gets when this process dies while the child still runs. */
  exitSignal?: NodeJS.Signals;
  /** Run under another identity (needs root), e.g. PostgreSQL as nobody. */
  runAs?: { uid: number; gid: number };
}

const setprivBin = ["/usr/bin/setpriv", "/bin/setpriv"].find((p) => fs.existsSync(p));

/**
 * Prefixes a command with setpriv, which execs it (same PID, so stop-by-PID
 * still hits the real server) after dropping privileges and arming a
 * parent-death signal: even if this process is SIGKILLed, no server is orphaned.
 */
export function wrapCommand(cmd: string, args: string[], o: { runAs?: { uid: number; gid: number }; parentDeathSignal?: NodeJS.Signals }): [string, string[]] {
  if (!setprivBin) {
    if (o.runAs) throw new Error("setpriv (Debian package util-linux) is needed to run servers as another user");
    return [cmd, args];
  }
  const pre = o.runAs ? [`--reuid=${o.runAs.uid}`, `--regid=${o.runAs.gid}`, "--clear-groups"] : [];
  if (o.parentDeathSignal) pre.push(`--pdeathsig=${o.parentDeathSignal}`);
  return pre.length ? [setprivBin, [...pre, "--", cmd, ...args]] : [cmd, args];
}

const live = new Map<ChildProcess, NodeJS.Signals>();
const spawnErrors = new WeakMap<ChildProcess, Error>();

// Backup for machines without setpriv: a parent that exits (uncaught error,
// process.exit) must not leave servers holding ports and data folders.
process.on("exit", () => {
  for (const [child, signal] of live) {
    try {
      if (isRunning(child) && child.pid) process.kill(child.pid, signal);
    } catch {
      /* already gone */
    }
  }
});

export function isRunning(child: ChildProcess): boolean {
  return child.pid !== undefined && child.exitCode === null && child.signalCode === null;
}

export function spawnLogged(name: string, cmd: string, args: string[], opts: SpawnLoggedOptions): ChildProcess {
  const signal = opts.exitSignal ?? "SIGTERM";
  const [bin, argv] = wrapCommand(cmd, args, { runAs: opts.runAs, parentDeathSignal: signal });
  fs.mkdirSync(path.dirname(opts.logFile), { recursive: true });
  const fd = fs.openSync(opts.logFile, "a");
  fs.writeSync(fd, `\n--- ${new Date().toISOString()} ${name}: ${bin} ${argv.join(" ")}\n`);
  // Handing the file descriptor to the child (instead of piping through us)
  // keeps logging working even when our event loop is busy or we are gone.
  const child = spawn(bin, argv, {
    cwd: opts.cwd ?? projectRoot,
    env: opts.env ?? process.env,
    stdio: ["ignore", fd, fd],
    detached: false,
  });
  fs.closeSync(fd);
  // Without a listener a failed spawn (ENOENT) would crash the parent.
  child.on("error", (err) => spawnErrors.set(child, err));
  live.set(child, signal);
  child.once("exit", () => live.delete(child));
  return child;
}

/** Throws if the child has already died, naming its log, so waits fail fast. */
export function assertAlive(child: ChildProcess, name: string, logFile: string): void {
  const error = spawnErrors.get(child);
  if (error) throw new Error(`${name} could not be started: ${error.message}`);
  if (!isRunning(child)) {
    const how = child.signalCode ? `signal ${child.signalCode}` : `code ${child.exitCode}`;
    throw new Error(`${name} exited with ${how}; last log lines:\n${tailLog(logFile)}`);
  }
}

export const logSize = (logFile: string) => (fs.existsSync(logFile) ? fs.statSync(logFile).size : 0);

/** Whether text was logged after offset: proof that this run's child got that far. */
export function logHasSince(logFile: string, offset: number, text: string): boolean {
  const fd = fs.openSync(logFile, "r");
  try {
    const buf = Buffer.alloc(Math.max(0, fs.fstatSync(fd).size - offset));
    fs.readSync(fd, buf, 0, buf.length, offset);
    return buf.toString("utf8").includes(text);
  } finally {
    fs.closeSync(fd);
  }
}

export function tailLog(logFile: string, lines = 20): string {
  try {
    return fs.readFileSync(logFile, "utf8").trimEnd().split("\n").slice(-lines).join("\n");
  } catch {
    return "(no log)";
  }
}

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

/**
 * Polls until check() resolves true. A check that throws aborts the wait at
 * once: checks return false for "not yet" and throw for "never".
 */
export async function waitFor(check: () => Promise<boolean>, timeoutMs: number, what: string): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  let delay = 20;
  for (;;) {
    if (await check()) return;
    if (Date.now() >= deadline) throw new Error(`Timed out after ${timeoutMs} ms waiting for ${what}`);
    await sleep(delay);
    delay = Math.min(delay * 2, 250);
  }
}

export function waitForExit(child: ChildProcess, timeoutMs: number): Promise<boolean> {
  if (!isRunning(child)) return Promise.resolve(true);
  return new Promise((resolve) => {
    const timer = setTimeout(() => resolve(false), timeoutMs);
    child.once("exit", () => {
      clearTimeout(timer);
      resolve(true);
    });
  });
}

export async function stopChild(child: ChildProcess, timeoutMs = 5000, signal: NodeJS.Signals = "SIGTERM"): Promise<void> {
  if (!isRunning(child) || child.pid === undefined) return;
  try {
    process.kill(child.pid, signal);
  } catch {
    return;
  }
  if (await waitForExit(child, timeoutMs)) return;
  try {
    process.kill(child.pid, "SIGKILL");
  } catch {
    return;
  }
  await waitForExit(child, 2000);
}

/** A port that was free a moment ago; good enough for local dev and tests. */
export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = net.createServer();
    srv.unref();
    srv.on("error", reject);
    srv.listen(0, "127.0.0.1", () => {
      const addr = srv.address();
      const port = typeof addr === "object" && addr ? addr.port : 0;
      srv.close(() => resolve(port));
    });
  });
}

export async function httpAnswers(url: string): Promise<boolean> {
  try {
    const res = await fetch(url, { signal: AbortSignal.timeout(1000) });
    await res.arrayBuffer();
    return true;
  } catch {
    return false;
  }
}
