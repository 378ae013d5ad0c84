import { existsSync, readFileSync } from "node:fs";
import path from "node:path";
import type { Knex } from "knex";
import type { Truth } from "../scripts/clips/synth-clip";
import { parseRate } from "../scripts/clips/synth-options";
import { actorByEmail, readOnce } from "./demo-reading-steps";
import type { Marks } from "./demo-results-plan";

// One disagreement in the demo, so a lead has a discrepancy to rule on: the two demo reviewers read
// drop 1 of QC-1001, the second marking the clear 1.5 s after the first (the demo edition's reading
// tolerance is 0.5 s). The first reader's marks are the recording's true frames.
export const DEMO_DISCREPANCY = { serial: "QC-1001", ordinal: 1, clearLaterS: 1.5 };

/**
 * Both demo reviewers read the drop, the second with the clear mark `clearLaterFrames` later. Each
 * reads only once, so a second call (or a drop someone already read) adds nothing. The drop's
 * state afterwards.
 */
export async function readDisagreeing(knex: Knex, dropId: string, first: Marks, clearLaterFrames: number): Promise<string> {
  const [reviewer, second] = await Promise.all(["reviewer@marrowfield.test", "reviewer2@marrowfield.test"].map((e) => actorByEmail(knex, e)));
  await readOnce(knex, reviewer, dropId, first);
  await readOnce(knex, second, dropId, { ...first, clearFrame: first.clearFrame + clearLaterFrames });
  return (await knex("drops").where({ id: dropId }).first("state")).state as string;
}

/** After the demo recordings are placed: the discrepancy, once its drop sits on its recording. */
export async function seedDemoDiscrepancy(knex: Knex, dataDir: string, log: (s: string) => void): Promise<void> {
  const { serial, ordinal, clearLaterS } = DEMO_DISCREPANCY;
  const drop = await knex("drops as d")
    .join("runs as r", "r.id", "d.run_id")
    .join("samples as x", "x.id", "r.sample_id")
    .where({ "x.serial": serial, "d.ordinal": ordinal })
    .whereNotNull("d.clip_id")
    .first("d.id", "d.state");
  const truthFile = path.join(dataDir, `${serial}.mp4.truth.json`);
  if (drop?.state !== "unread" || !existsSync(truthFile)) return;
  const truth = JSON.parse(readFileSync(truthFile, "utf8")) as Truth;
  const t = truth.drops[ordinal - 1];
  const rate = parseRate(truth.options.fps);
  const state = await readDisagreeing(
    knex,
    drop.id,
    { dispenseFrame: t.dispenseFrame, clearFrame: t.clearFrame },
    Math.round((clearLaterS * rate.num) / rate.den),
  );
  log(`demo discrepancy: ${serial} drop ${ordinal} read by both reviewers (${state}); a lead finds it among the discrepancies`);
}
