import { randomUUID } from "node:crypto";
import { mkdirSync, existsSync, statSync } from "node:fs";
import path from "node:path";
import type { Knex } from "knex";
import { insertClip, insertSteps, listClipsOfRun, updateClip } from "../lib/clips/queries";
import { clipObjectKey, STEPS } from "../lib/clips/rules";
import { enqueue } from "../lib/jobs";
import { putObjectFile } from "../lib/storage";
import { renderSyntheticClip } from "../scripts/clips/synth-clip";

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
  for (const c of DEMO_CLIPS) {
    const run = await knex("runs as r").join("samples as x", "x.id", "r.sample_id").where("x.serial", c.serial).first("r.id");
    if (!run || (await listClipsOfRun(knex, run.id)).length > 0) continue;
    const file = path.join(dataDir, `${c.serial}.mp4`);
    if (!existsSync(file)) {
      log(`rendering the demo recording of ${c.serial} (about a minute)…`);
      await renderSyntheticClip({ out: file, fps: c.fps, seed: c.seed, drops: 3, durations: c.durations, length: 3 * 175, width: 640, height: 360, noise: 8 });
    }
    const id = randomUUID();
    const key = clipObjectKey(id, "original");
    await putObjectFile(key, file, "video/mp4");
    const size = statSync(file).size;
    await insertClip(knex, { id, runId: run.id, originalName: `demo-${c.serial}.mp4`, declaredType: "video/mp4", declaredSize: size, objectKey: key, uploadedBy: technician.id });
    await updateClip(knex, id, { status: "processing", storedSize: size, uploadedAt: new Date() });
    await insertSteps(knex, id, STEPS);
    await enqueue("clipVerify", { clipId: id });
    log(`demo recording of ${c.serial} uploaded; the worker is processing it`);
  }
}
