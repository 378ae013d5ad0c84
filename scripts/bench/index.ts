import { execFileSync, spawnSync } from "node:child_process";
import { existsSync, mkdirSync, rmSync } from "node:fs";
import path from "node:path";
import { proxyArgs } from "../../lib/video/proxy";
import { renderSyntheticClip } from "../clips/synth-clip";
import { projectRoot } from "../services/service";

async function main() {
  // `npm run bench`: the worker's frame index and proxy against the bare ffprobe/ffmpeg commands on
  // the same generated clip, in the same run (ratios, so a busy machine affects both sides alike),
  // and the worker's peak memory. Options: --minutes N (default 30), --size WxH (default 1920x1080),
  // --skip-proxy. The generated clip is kept in .data/bench for the next run.
  const arg = (name: string, fallback: string) => {
    const i = process.argv.indexOf(`--${name}`);
    return i > 0 ? process.argv[i + 1] : fallback;
  };
  const minutes = Number(arg("minutes", "30"));
  const [width, height] = arg("size", "1920x1080").split("x").map(Number);
  const skipProxy = process.argv.includes("--skip-proxy");
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

  const bareIndex = seconds(() =>
    execFileSync("ffprobe", ["-v", "error", "-select_streams", "v:0", "-show_entries", "packet=pts,dts,flags", "-of", "csv=p=0", clip], { maxBuffer: 1 << 30, stdio: ["ignore", "ignore", "inherit"] }),
  );
  const loader = path.join(projectRoot, "node_modules", "tsx", "dist", "loader.mjs");
  const ours = spawnSync(process.execPath, ["--import", loader, path.join(projectRoot, "scripts", "bench", "steps.ts"), clip, path.join(dir, "proxy-ours.mp4"), skipProxy ? "skip-proxy" : ""], { encoding: "utf8", maxBuffer: 1 << 24 });
  if (ours.status !== 0) throw new Error(`the worker steps failed: ${ours.stderr}`);
  const r = JSON.parse(ours.stdout.trim().split("\n").pop()!) as { indexMs: number; proxyMs: number | null; frames: number; storedBytes: number; gop: number; timescale: number; peakRssMb: number };
  const bareProxy = skipProxy ? null : seconds(() => execFileSync("ffmpeg", proxyArgs(clip, path.join(dir, "proxy-bare.mp4"), { timescale: r.timescale, gop: r.gop })));
  rmSync(path.join(dir, "proxy-ours.mp4"), { force: true });
  rmSync(path.join(dir, "proxy-bare.mp4"), { force: true });

  const row = (what: string, ours: number, bare: number, goal: number) =>
    `${what.padEnd(14)} ours ${ours.toFixed(2).padStart(8)} s   bare ${bare.toFixed(2).padStart(8)} s   ratio ${(ours / bare).toFixed(2)}×   goal ≤ ${goal}× ${ours / bare <= goal ? "met" : "NOT met"}`;
  console.log(`\n${minutes}-minute ${width}×${height} clip, ${r.frames} frames, index stored in ${(r.storedBytes / 1024).toFixed(0)} kB`);
  console.log(row("frame index", r.indexMs / 1000, bareIndex, 1.2));
  if (bareProxy !== null && r.proxyMs !== null) console.log(row("proxy", r.proxyMs / 1000, bareProxy, 1.1));
  console.log(`worker peak memory ${r.peakRssMb.toFixed(0)} MB   goal ≤ 300 MB ${r.peakRssMb <= 300 ? "met" : "NOT met"}`);
}

main().catch((err) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
