import { existsSync, mkdirSync, readFileSync } from "node:fs";
import path from "node:path";
import type { Knex } from "knex";
import type { Actor } from "../lib/auth/actor";
import { listClipsOfRun } from "../lib/clips/queries";
import { placeDrop } from "../lib/drops/service";
import { acceptRun, getRun } from "../lib/runs/service";
import { clipSettled, ingestClipFile } from "../scripts/clips/ingest";
import { renderSyntheticClip, type Truth } from "../scripts/clips/synth-clip";
import { parseRate } from "../scripts/clips/synth-options";
import { actorByEmail, readOnce } from "./demo-reading-steps";
import { clipLengthS, DEMO_BALLS, DEMO_READ_SUBMISSION, secondReaderMarks, type DemoBall, type Marks } from "./demo-results-plan";

// The demo's read submission: every run of D-2026-0002 gets a synthetic recording, processed by
// the real worker; the technician places its drops and both reviewers read every drop through the
// real services, so the results screens have data. Idempotent: what exists is kept and skipped.

export interface DemoReadingsOptions {
  /** Recording size and rate; tests pass smaller ones. Defaults: 320×180 at 25 fps. */
  width?: number;
  height?: number;
  fps?: string;
  noise?: number;
  /** How long to wait for the worker to make one recording ready, seconds (default 1800). */
  clipTimeoutS?: number;
}

export interface DemoClipTiming {
  serial: string;
  /** Seconds spent rendering the recording; null when it was rendered or ingested before. */
  renderS: number | null;
  /** The worker's busy time on the recording (sum of its steps), and upload to ready. */
  workerS: number | null;
  workerWallS: number | null;
}

export interface DemoReadingsResult {
  timings: DemoClipTiming[];
  readingsSubmitted: number;
  problems: string[];
}

const LOCK = "select pg_advisory_xact_lock(hashtext('wickmark-demo-readings'))";

/** Safe to call from two processes at once: the second waits for the first and then finds it all done. */
export async function seedDemoReadings(knex: Knex, dataDir: string, log: (s: string) => void, options: DemoReadingsOptions = {}): Promise<DemoReadingsResult> {
  return knex.transaction(async (trx) => {
    await trx.raw(LOCK);
    return seedUnderLock(knex, dataDir, log, options);
  });
}

interface Pending {
  ball: DemoBall;
  index: number;
  runId: string;
  clipId: string;
  clipName: string;
  timing: DemoClipTiming;
}

async function seedUnderLock(knex: Knex, dataDir: string, log: (s: string) => void, o: DemoReadingsOptions): Promise<DemoReadingsResult> {
  const t0 = Date.now();
  const result: DemoReadingsResult = { timings: [], readingsSubmitted: 0, problems: [] };
  const problem = (s: string) => (result.problems.push(s), log(`demo readings: ${s}`));
  const [technician, reviewer, second, lead] = await Promise.all(
    ["technician@marrowfield.test", "reviewer@marrowfield.test", "reviewer2@marrowfield.test", "lead@marrowfield.test"].map((e) => actorByEmail(knex, e)),
  );
  mkdirSync(dataDir, { recursive: true });
  const pending: Pending[] = [];
  for (const [index, ball] of DEMO_BALLS.entries()) {
    const run = await knex("runs as r")
      .join("samples as x", "x.id", "r.sample_id")
      .join("submissions as s", "s.id", "x.submission_id")
      .where({ "s.reference": DEMO_READ_SUBMISSION, "x.serial": ball.serial })
      .orderBy("r.created_at")
      .first("r.id");
    if (!run) {
      problem(`${ball.serial} has no run, so nothing to read`);
      continue;
    }
    if (await runIsDone(knex, run.id, ball, lead)) continue;
    const timing: DemoClipTiming = { serial: ball.serial, renderS: null, workerS: null, workerWallS: null };
    result.timings.push(timing);
    const clip = await demoClipOf(knex, run.id, ball, dataDir, technician.id, o, timing, log);
    pending.push({ ball, index, runId: run.id, ...clip, timing });
  }
  // Rendering went first: the worker processed each recording while the next was being rendered.
  for (const p of pending) {
    try {
      result.readingsSubmitted += await settleAndRead(knex, p, dataDir, { technician, reviewer, second, lead }, o, log);
    } catch (e) {
      problem(`${p.ball.serial} stopped: ${e instanceof Error ? e.message : e}`);
    }
  }
  if (pending.length)
    log(
      `demo readings: ${pending.length} balls of ${DEMO_READ_SUBMISSION} done, ${result.readingsSubmitted} readings submitted, in ${secs(Date.now() - t0)} s`,
    );
  else if (!result.problems.length) log(`demo readings of ${DEMO_READ_SUBMISSION} are already there`);
  return result;
}

/** Nothing left for this ball: every drop read twice (or further on), and any flagged run accepted. */
async function runIsDone(knex: Knex, runId: string, ball: DemoBall, lead: Actor): Promise<boolean> {
  const open = await knex("drops")
    .where({ run_id: runId })
    .where((w) => w.whereNull("clip_id").orWhereIn("state", ["unread", "read once"]))
    .first("id");
  if (open) return false;
  if (!ball.acceptReason) return true;
  const run = await getRun(lead, runId);
  return run.flags.length === 0 || run.acceptedAt !== null;
}

/** The demo recording of this run: the one ingested before, or rendered (unless on disk) and ingested now. */
async function demoClipOf(
  knex: Knex,
  runId: string,
  ball: DemoBall,
  dataDir: string,
  uploadedBy: string,
  o: DemoReadingsOptions,
  timing: DemoClipTiming,
  log: (s: string) => void,
) {
  const existing = (await listClipsOfRun(knex, runId)).find(
    (c) => c.originalName.startsWith(`demo-${ball.serial}-`) && c.status !== "rejected" && c.status !== "failed",
  );
  if (existing) return { clipId: existing.id, clipName: existing.originalName };
  const width = o.width ?? 320;
  const height = o.height ?? 180;
  const fps = o.fps ?? "25";
  const clipName = `demo-${ball.serial}-${width}x${height}-${fps.replace("/", "_")}fps.mp4`;
  const file = path.join(dataDir, clipName);
  if (!existsSync(`${file}.truth.json`)) {
    const t = Date.now();
    await renderSyntheticClip({
      out: file,
      fps,
      seed: ball.seed,
      drops: 3,
      durations: ball.durations,
      length: clipLengthS(ball.durations),
      width,
      height,
      noise: o.noise ?? 6,
    });
    timing.renderS = secs(Date.now() - t);
    log(`demo readings: recording of ${ball.serial} rendered in ${timing.renderS} s; the worker is processing it`);
  }
  return { clipId: await ingestClipFile(knex, runId, file, uploadedBy, clipName), clipName };
}

interface Cast {
  technician: Actor;
  reviewer: Actor;
  second: Actor;
  lead: Actor;
}

/** Waits for the worker, places the drops, reads each twice, accepts a flagged run. Readings submitted. */
async function settleAndRead(knex: Knex, p: Pending, dataDir: string, cast: Cast, o: DemoReadingsOptions, log: (s: string) => void): Promise<number> {
  const timeoutS = o.clipTimeoutS ?? 1800;
  const status = await clipSettled(knex, p.clipId, timeoutS);
  if (status !== "ready") {
    const steps = await knex("clip_steps").where({ clip_id: p.clipId }).select("step", "state", "reason");
    const detail = steps.map((s) => `${s.step} ${s.state}${s.reason ? ` (${s.reason})` : ""}`).join(", ");
    throw new Error(`its recording ${p.clipName} is ${status}, not ready, after waiting up to ${timeoutS} s (${detail}); see the worker log`);
  }
  await workerTiming(knex, p.clipId, p.timing);
  if (p.timing.workerS !== null)
    log(`demo readings: recording of ${p.ball.serial} ready (worker busy ${p.timing.workerS} s, ${p.timing.workerWallS} s from upload)`);
  const truthFile = path.join(dataDir, `${p.clipName}.truth.json`);
  if (!existsSync(truthFile))
    throw new Error(`${truthFile} is missing, so the true frames of its drops are unknown; remove the recording from the run or restore the file`);
  const truth = JSON.parse(readFileSync(truthFile, "utf8")) as Truth;
  const rate = parseRate(truth.options.fps);
  const drops = await knex("drops").where({ run_id: p.runId }).orderBy("ordinal").select("id", "ordinal", "clip_id");
  let submitted = 0;
  for (const d of drops) {
    const t = truth.drops[d.ordinal - 1];
    if (!t) continue;
    // Placed a second before the dispense, as a technician would jot it down while filming.
    if (!d.clip_id) await placeDrop(cast.technician, d.id, { clipId: p.clipId, startFrame: Math.max(0, t.dispenseFrame - Math.round(rate.num / rate.den)) });
    else if (d.clip_id !== p.clipId) throw new Error(`drop ${d.ordinal} is placed on another recording; its readings are left to people`);
    const first: Marks = { dispenseFrame: t.dispenseFrame, clearFrame: t.clearFrame };
    submitted += await readOnce(knex, cast.reviewer, d.id, first);
    submitted += await readOnce(knex, cast.second, d.id, secondReaderMarks(p.index, d.ordinal, first));
  }
  if (p.ball.acceptReason) {
    const run = await getRun(cast.lead, p.runId);
    if (run.flags.length && !run.acceptedAt) await acceptRun(cast.lead, p.runId, p.ball.acceptReason);
  }
  const states = await knex("drops").where({ run_id: p.runId }).pluck("state");
  log(`demo readings: ${p.ball.serial} read (${states.join(", ")})`);
  return submitted;
}

async function workerTiming(knex: Knex, clipId: string, timing: DemoClipTiming): Promise<void> {
  const row = await knex("clip_steps as s")
    .join("clips as c", "c.id", "s.clip_id")
    .where("s.clip_id", clipId)
    .first(
      knex.raw("sum(extract(epoch from s.finished_at - s.started_at)) as busy"),
      knex.raw("extract(epoch from max(c.ready_at) - max(c.uploaded_at)) as wall"),
    );
  timing.workerS = row?.busy == null ? null : Math.round(Number(row.busy) * 10) / 10;
  timing.workerWallS = row?.wall == null ? null : Math.round(Number(row.wall) * 10) / 10;
}

const secs = (ms: number) => Math.round(ms / 100) / 10;
