import { randomUUID } from "node:crypto";
import { statSync } from "node:fs";
import path from "node:path";
import type { Knex } from "knex";
import { insertClip, insertSteps, updateClip } from "../../lib/clips/queries";
import { clipObjectKey } from "../../lib/clips/object-keys";
import { STEPS } from "../../lib/clips/rules";
import { enqueue } from "../../lib/jobs";
import { putObjectFile } from "../../lib/storage";

// A recording put on a run from the server side (demo data, benchmarks): stored as an original and
// handed to the same worker steps as a browser upload. Returns the clip's id.
export async function ingestClipFile(knex: Knex, runId: string, file: string, uploadedBy: string, name = path.basename(file)): Promise<string> {
  const id = randomUUID();
  const key = clipObjectKey(id, "original");
  await putObjectFile(key, file, "video/mp4");
  const size = statSync(file).size;
  await insertClip(knex, { id, runId, originalName: name, declaredType: "video/mp4", declaredSize: size, objectKey: key, uploadedBy });
  await updateClip(knex, id, { status: "processing", storedSize: size, uploadedAt: new Date() });
  await insertSteps(knex, id, STEPS);
  await enqueue("clipVerify", { clipId: id });
  return id;
}

/** Waits for the worker to finish with a clip; its final status. */
export async function clipSettled(knex: Knex, clipId: string, timeoutS = 3600): Promise<string> {
  for (let waited = 0; ; waited += 1) {
    const clip = await knex("clips").where({ id: clipId }).first("status");
    if (clip.status !== "processing" && clip.status !== "uploading") return clip.status;
    if (waited > timeoutS) return clip.status;
    await new Promise((r) => setTimeout(r, 1000));
  }
}
