import "server-only";
import { spawn } from "node:child_process";

export interface ExecResult {
  code: number;
  stdout: string;
  stderr: string;
}

/** Runs a tool with an argument list (never a shell); keeps at most `maxOutput` bytes of stdout and the tail of stderr. */
export function execTool(cmd: string, args: string[], opts: { timeoutMs?: number; maxOutput?: number } = {}): Promise<ExecResult> {
  const max = opts.maxOutput ?? 16 * 1024 * 1024;
  return new Promise((resolve, reject) => {
    const child = spawn(cmd, args, { stdio: ["ignore", "pipe", "pipe"] });
    const out: Buffer[] = [];
    const err: Buffer[] = [];
    let outLen = 0;
    let errLen = 0;
    child.stdout.on("data", (d: Buffer) => {
      if (outLen < max) out.push(d);
      outLen += d.length;
    });
    child.stderr.on("data", (d: Buffer) => {
      errLen += d.length;
      err.push(d);
      // The useful line is the last one: keep only the tail.
      while (errLen > 64 * 1024 && err.length > 1) errLen -= err.shift()!.length;
    });
    const timer = opts.timeoutMs ? setTimeout(() => child.kill("SIGKILL"), opts.timeoutMs) : undefined;
    child.on("error", (e) => {
      clearTimeout(timer);
      reject(new Error(`${cmd} could not be started: ${e.message}`));
    });
    child.on("close", (code, signal) => {
      clearTimeout(timer);
      resolve({ code: code ?? (signal ? 128 : 1), stdout: Buffer.concat(out).toString("utf8"), stderr: Buffer.concat(err).toString("utf8") });
    });
  });
}
