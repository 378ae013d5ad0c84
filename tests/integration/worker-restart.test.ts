import { readFileSync } from "node:fs";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb, db } from "@/lib/db";
import { listOrganisations } from "@/lib/organisations/queries";
import { signedIn, type Client } from "../helpers/app";
import { uploadFile, waitForClip } from "../helpers/clips";
import { demo } from "../helpers/fixtures";
import { newRun, newSample, newSubmission } from "../helpers/intake";
import { clipNeedingProxy } from "../helpers/media";

// A worker killed in the middle of a job: `npm test` supervises the worker as a service manager
// would and starts it again; the job held by the dead worker expires and runs again to the end.
// It kills the one worker every file shares, so vitest.config.mts runs it alone, after the rest.
let tech: Client;
let runId: string;
const pidFile = process.env.WORKER_PID_FILE!;
const workerPid = () => Number(readFileSync(pidFile, "utf8"));

beforeAll(async () => {
  tech = await signedIn(demo.email("technician"), demo.password);
  const s = await newSubmission(tech, (await listOrganisations(db()))[0].id);
  runId = (await newRun(tech, (await newSample(tech, s.id)).id)).id;
});
afterAll(() => closeDb());

const stepState = async (clipId: string, step: string) =>
  (await db()("clip_steps").where({ clip_id: clipId, step }).first("state", "attempts")) as { state: string; attempts: number } | undefined;

describe("a worker killed mid-job", () => {
  it("runs the job again after a restart and ends in the same state", { timeout: 180_000 }, async () => {
    expect(pidFile, "run through npm test").toBeTruthy();
    const { clipId } = await uploadFile(tech, runId, clipNeedingProxy(), { name: "long.mkv" });
    const end = Date.now() + 90_000;
    while ((await stepState(clipId, "proxy"))?.state !== "running") {
      if (Date.now() > end) throw new Error("the proxy step never started");
      await new Promise((r) => setTimeout(r, 100));
    }
    const killed = workerPid();
    process.kill(killed, "SIGKILL");

    const clip = await waitForClip(tech, clipId, 150_000);
    expect(workerPid()).not.toBe(killed);
    expect(clip.status).toBe("ready");
    const proxy = clip.steps.find((s) => s.step === "proxy")!;
    expect(proxy.state).toBe("done");
    expect(proxy.attempts).toBe(2);
    expect(clip.playback?.isProxy).toBe(true);
    expect(clip.index?.frameCount).toBe(15 * 60);
    expect(clip.steps.map((s) => s.state)).toEqual(["done", "done", "done", "done", "done"]);
  });
});
