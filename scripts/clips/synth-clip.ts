import { spawn } from "node:child_process";
import { mkdir, mkdtemp, rm, writeFile } from "node:fs/promises";
import os from "node:os";
import path from "node:path";
import { pathToFileURL } from "node:url";
import { probePacketTimes } from "../../lib/frame-index/packets";
import { CODEC, ffmpegArgs, type GraphInputs } from "./synth-graph";
import { dropSprite, glintSprite, surfacePpm } from "./synth-images";
import { parseCli, resolveOptions, type SynthOptions } from "./synth-options";
import { planDrops, planFrames, shakeMargin } from "./synth-plan";
import { buildTruth, type Truth } from "./synth-truth";

// Renders an invented ball surface with oil drops whose dispense and clear moments are known
// exactly, burns a frame code into every frame, and writes the ground truth next to the clip.
//   npm run synth-clip -- --out /tmp/clip.mp4 --size 1920x1080 --length 60
// Frame numbers in the truth are found again in the encoded file's own timestamps, so they hold
// for whatever the container did to them (start offsets, B-frame delays, rounding).

export type { Truth } from "./synth-truth";
export type { SynthOptions } from "./synth-options";

function run(cmd: string, args: string[]): Promise<void> {
  return new Promise((resolve, reject) => {
    const child = spawn(cmd, args, { stdio: ["ignore", "ignore", "pipe"] });
    let stderr = "";
    child.stderr.on("data", (d: Buffer) => {
      stderr = (stderr + d.toString("utf8")).slice(-4000);
    });
    child.on("error", (e) => reject(new Error(`${cmd} could not be started: ${e.message}`)));
    child.on("close", (code) => (code === 0 ? resolve() : reject(new Error(`${cmd} failed (${code}): ${stderr.trim()}`))));
  });
}

export async function renderSyntheticClip(options: Partial<SynthOptions> & { out: string }): Promise<{ file: string; truthFile: string; truth: Truth }> {
  const o = resolveOptions({ ...options, out: path.resolve(options.out) });
  const frames = planFrames(o);
  const drops = planDrops(o, frames);
  const margin = shakeMargin(o.height);
  await mkdir(path.dirname(o.out), { recursive: true });
  const work = await mkdtemp(path.join(os.tmpdir(), "wickmark-synth-"));
  try {
    const inputs: GraphInputs = { surface: path.join(work, "surface.ppm"), drops: [] };
    await writeFile(inputs.surface, surfacePpm(o.width, o.height, margin, o.seed));
    for (const d of drops) {
      const body = { file: path.join(work, `drop-${d.index}.pam`), sprite: dropSprite(d.rx, d.ry) };
      const glint = { file: path.join(work, `glint-${d.index}.pam`), sprite: glintSprite(d.rx, d.ry) };
      await writeFile(body.file, body.sprite.data);
      await writeFile(glint.file, glint.sprite.data);
      inputs.drops.push({ body, glint });
    }
    await run("ffmpeg", ffmpegArgs(o, frames, drops, inputs, margin));
  } finally {
    await rm(work, { recursive: true, force: true });
  }
  const truth = buildTruth(o.out, o, frames, drops, await probePacketTimes(o.out), { codec: CODEC[o.container], shakePx: margin });
  const truthFile = `${o.out}.truth.json`;
  await writeFile(truthFile, `${JSON.stringify(truth, null, 2)}\n`);
  return { file: o.out, truthFile, truth };
}

async function main(): Promise<number> {
  const parsed = parseCli(process.argv.slice(2));
  if ("help" in parsed) {
    console.log(parsed.help);
    return process.argv.includes("--help") || process.argv.includes("-h") ? 0 : 2;
  }
  const t0 = Date.now();
  const { file, truthFile, truth } = await renderSyntheticClip(parsed);
  console.log(`${file}: ${truth.video.frameCount} frames in ${((Date.now() - t0) / 1000).toFixed(1)} s; truth in ${truthFile}`);
  for (const d of truth.drops) {
    console.log(
      `  drop ${d.index}: frames ${d.dispenseFrame}→${d.clearFrame}, ${d.dispenseTime.toFixed(3)}→${d.clearTime.toFixed(3)} s (${d.trueDuration.toFixed(3)} s) at ${d.x},${d.y} r${d.radius}`,
    );
  }
  return 0;
}

if (process.argv[1] && import.meta.url === pathToFileURL(path.resolve(process.argv[1])).href) {
  main().then(
    (code) => process.exit(code),
    (e: Error) => {
      console.error(e.message);
      process.exit(1);
    },
  );
}
