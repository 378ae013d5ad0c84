import { existsSync, mkdirSync, readFileSync } from "node:fs";
import path from "node:path";
import type { Knex } from "knex";
import { listClipsOfRun } from "../lib/clips/queries";
import { clipSettled, ingestClipFile } from "../scripts/clips/ingest";
import { renderSyntheticClip, type Truth } from "../scripts/clips/synth-clip";
import { seedDemoDiscrepancy } from "./demo-discrepancy";

// Demo recordings: synthetic clips whose drops take a known time (near the demo edition's 135 s
// minimum), attached to the demo runs and processed by the real worker. Rendered once, in the
// background after `npm start` serves the app, and kept in the data folder.
const DEMO_CLIPS = [
  { serial: "QC-1001", fps: "30", seed: 11, durations: [141.3, 138.9, 144.2] },
  { serial: "QC-1002", fps: "30000/1001", seed: 12, durations: [136.4, 139.7, 133.8] },
];

export async function seedDemoClips(knex: Knex, dataDir: string, log: (s: string) => void): Promise<void> {
  const technician = await knex("users").where({ email: "technician@marrowfield.test" }).first("id");
  mkdirSync(dataDir, { recursive: true });
  const toPlace: [runId: string, clipId: string, truthFile: string][] = [];
  for (const c of DEMO_CLIPS) {
    const run = await knex("runs as r").join("samples as x", "x.id", "r.sample_id").where("x.serial", c.serial).first("r.id");
    if (!run) continue;
    const existing = await listClipsOfRun(knex, run.id);
    if (existing.length > 0) {
      toPlace.push([run.id, existing[0].id, `${path.join(dataDir, `${c.serial}.mp4`)}.truth.json`]);
      continue;
    }
    const file = path.join(dataDir, `${c.serial}.mp4`);
    if (!existsSync(file)) {
      log(`rendering the demo recording of ${c.serial} (about a minute)…`);
      await renderSyntheticClip({ out: file, fps: c.fps, seed: c.seed, drops: 3, durations: c.durations, length: 3 * 175, width: 640, height: 360, noise: 8 });
    }
    const id = await ingestClipFile(knex, run.id, file, technician.id, `demo-${c.serial}.mp4`);
    log(`demo recording of ${c.serial} uploaded; the worker is processing it`);
    toPlace.push([run.id, id, `${file}.truth.json`]);
  }
  for (const [runId, clipId, truthFile] of toPlace) await placeDemoDrops(knex, runId, clipId, truthFile, technician.id, log);
  await seedDemoDiscrepancy(knex, dataDir, log);
}

/**
 * Once the worker has made the clip ready, the technician's placements: each drop a second before
 * its true dispense, as a technician would jot it down while filming.
 */
async function placeDemoDrops(knex: Knex, runId: string, clipId: string, truthFile: string, placedBy: string, log: (s: string) => void): Promise<void> {
  if (!existsSync(truthFile)) return;
  if ((await clipSettled(knex, clipId)) !== "ready") return;
  const truth = JSON.parse(readFileSync(truthFile, "utf8")) as Truth;
  const drops = await knex("drops").where({ run_id: runId }).whereNull("clip_id").orderBy("ordinal").select("id", "ordinal");
  for (const d of drops) {
    const t = truth.drops[d.ordinal - 1];
    if (!t) continue;
    await knex("drops")
      .where({ id: d.id })
      .update({ clip_id: clipId, start_frame: Math.max(0, t.dispenseFrame - 30), placed_by: placedBy, placed_at: knex.fn.now() });
  }
  if (drops.length) log(`demo drops placed on their recording; reviewers find them in the reading queue`);
}
