import { execFileSync, spawnSync } from "node:child_process";
import { existsSync, mkdirSync, rmSync } from "node:fs";
import path from "node:path";
import { proxyArgs } from "../../lib/video/proxy";
import { renderSyntheticClip } from "../clips/synth-clip";
import { PROFILES } from "../profiles";
import { projectRoot, SERVER_TS_ARGS } from "../services/service";
import { benchApi } from "./api";

const arg = (name: string, fallback: string) => {
  const i = process.argv.indexOf(`--${name}`);
  return i > 0 ? process.argv[i + 1] : fallback;
};

async function main() {
  // `npm run bench` runs every part; `-- --only worker|player|api` one of them.
  // The player part: --player-seconds N (default 25) of 1080p at 30 fps; --player-gop N builds its
  // proxy with another keyframe interval than the worker's. The API part:
  // --connections N (default 50), --api-rounds N (default 4), --per-connection N (default 10).
  const only = arg("only", "all");
  // The bench's stack runs on the test profile's ports (moved by WICKMARK_PORT_OFFSET); its clients
  // must never talk to whatever answers on the default test port.
  process.env.APP_URL = `http://127.0.0.1:${PROFILES.test.ports.app}`;
  if (!["all", "worker", "player", "api"].includes(only)) throw new Error(`--only takes worker, player or api, not ${only}`);
  if (only === "all" || only === "worker") await benchWorker();
  // Imported when used: the player brings tests/helpers/app, whose APP_URL is read once, at import,
  // and must already be the bench stack's (set above).
  if (only === "all" || only === "player")
    await (await import("./player")).benchPlayer({
      seconds: Number(arg("player-seconds", "25")),
      width: 1920,
      height: 1080,
      gop: process.argv.includes("--player-gop") ? Number(arg("player-gop", "15")) : undefined,
    });
  if (only === "all" || only === "api") await reportApi();
}

async function reportApi() {
  const r = await benchApi({
    connections: Number(arg("connections", "50")),
    perConnection: Number(arg("per-connection", "10")),
    rounds: Number(arg("api-rounds", "4")),
  });
  const ms = (v: number) => `${v.toFixed(1)} ms`;
  console.log(`\nreading-submit API, ${r.connections} connections, ${r.perPhase} timed requests per phase and round:`);
  console.log(`  submit:   median ${ms(r.submit.median)}, p95 ${ms(r.submit.p95)} (n = ${r.submit.n})`);
  console.log(`  baseline: median ${ms(r.baseline.median)}, p95 ${ms(r.baseline.p95)} (one insert behind the same wrapper)`);
  console.log(`  p95 ratio, median of rounds: ${r.ratioP95.toFixed(2)}× (rounds: ${r.roundRatios.map((x) => x.toFixed(2)).join(", ")}; goal ≤ 2×)`);
}

async function benchWorker() {
  // The worker's frame index and proxy against the bare ffprobe/ffmpeg commands on the same
  // generated clip, in the same run (ratios, so a busy machine affects both sides alike), and the
  // worker's peak memory. Options: --minutes N (default 30), --size WxH (default 1920x1080),
  // --rounds N (default 3), --skip-proxy. The generated clip is kept in .data/bench for the next run.
  const minutes = Number(arg("minutes", "30"));
  const [width, height] = arg("size", "1920x1080").split("x").map(Number);
  const skipProxy = process.argv.includes("--skip-proxy");
  const rounds = Number(arg("rounds", "3"));
  const dir = path.join(projectRoot, ".data", "bench");
  mkdirSync(dir, { recursive: true });
  const clip = path.join(dir, `synthetic-${minutes}min-${width}x${height}.mp4`);

  const seconds = (f: () => void) => {
    const t = performance.now();
    f();
    return (performance.now() - t) / 1000;
  };

  if (!existsSync(clip)) {
    console.log(`rendering a ${minutes}-minute ${width}×${height} synthetic clip (kept for later runs)…`);
    const t = performance.now();
    await renderSyntheticClip({ out: clip, length: minutes * 60, width, height, fps: "30", drops: Math.max(3, Math.round(minutes / 3)), noise: 10 });
    console.log(`  rendered in ${((performance.now() - t) / 1000).toFixed(1)} s`);
  }

  const ours = (step: "index" | "proxy") => {
    const r = spawnSync(
      process.execPath,
      [...SERVER_TS_ARGS, path.join(projectRoot, "scripts", "bench", "steps.ts"), step, clip, path.join(dir, "proxy-ours.mp4")],
      { encoding: "utf8", maxBuffer: 1 << 24 },
    );
    if (r.status !== 0) throw new Error(`the worker step failed: ${r.stderr}`);
    return JSON.parse(r.stdout.trim().split("\n").pop()!) as {
      indexMs: number;
      proxyMs: number | null;
      frames: number;
      storedBytes: number;
      gop: number;
      timescale: number;
      peakRssMb: number;
    };
  };
  const bareIndexRun = () =>
    seconds(() =>
      execFileSync("ffprobe", ["-v", "error", "-select_streams", "v:0", "-show_entries", "packet=pts,dts,flags", "-of", "csv=p=0", clip], {
        maxBuffer: 1 << 30,
        stdio: ["ignore", "ignore", "inherit"],
      }),
    );
  // Rounds alternate which side goes first, so a neighbour's load falls on both sides alike.
  const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
  const oursIndex: number[] = [];
  const bareIndexTimes: number[] = [];
  let r = ours("index");
  for (let i = 0; i < rounds * 2 + 1; i++) {
    if (i % 2 === 0) {
      r = ours("index");
      oursIndex.push(r.indexMs / 1000);
      bareIndexTimes.push(bareIndexRun());
    } else {
      bareIndexTimes.push(bareIndexRun());
      r = ours("index");
      oursIndex.push(r.indexMs / 1000);
    }
  }
  const oursProxy: number[] = [];
  const bareProxyTimes: number[] = [];
  let peak = r.peakRssMb;
  const bareProxyRun = () => seconds(() => execFileSync("ffmpeg", proxyArgs(clip, path.join(dir, "proxy-bare.mp4"), { timescale: r.timescale, gop: r.gop })));
  for (let i = 0; !skipProxy && i < rounds; i++) {
    const runOurs = () => {
      const p = ours("proxy");
      oursProxy.push(p.proxyMs! / 1000);
      peak = Math.max(peak, p.peakRssMb);
    };
    if (i % 2 === 0) {
      runOurs();
      bareProxyTimes.push(bareProxyRun());
    } else {
      bareProxyTimes.push(bareProxyRun());
      runOurs();
    }
  }
  rmSync(path.join(dir, "proxy-ours.mp4"), { force: true });
  rmSync(path.join(dir, "proxy-bare.mp4"), { force: true });

  const row = (what: string, ours: number, bare: number, goal: number) =>
    `${what.padEnd(14)} ours ${ours.toFixed(2).padStart(8)} s   bare ${bare.toFixed(2).padStart(8)} s   ratio ${(ours / bare).toFixed(2)}×   goal ≤ ${goal}× ${ours / bare <= goal ? "met" : "NOT met"}`;
  console.log(
    `\n${minutes}-minute ${width}×${height} clip, ${r.frames} frames, index stored in ${(r.storedBytes / 1024).toFixed(0)} kB; medians of ${oursIndex.length} index and ${oursProxy.length} proxy rounds`,
  );
  console.log(row("frame index", median(oursIndex), median(bareIndexTimes), 1.2));
  if (oursProxy.length) console.log(row("proxy", median(oursProxy), median(bareProxyTimes), 1.1));
  console.log(`worker peak memory ${peak.toFixed(0)} MB   goal ≤ 300 MB ${peak <= 300 ? "met" : "NOT met"}`);
}

main().catch((err) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
