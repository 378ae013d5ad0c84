import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb, db } from "@/lib/db";
import type { ResultsView } from "@/lib/results/view";
import type { RunDetail as RunView } from "@/lib/runs/service";
import { signedIn, type Client } from "../helpers/app";
import { demo, demoOrganisationId, makeUser } from "../helpers/fixtures";
import { goodRun, newEdition, newRun, newSample, newSubmission } from "../helpers/intake";
import { plainMp4 } from "../helpers/media";
import { json, placedDrops, placeOnRun, read } from "../helpers/readings";
import { blockedBehind, settles } from "../helpers/locks";

// Which run counts for a ball, voiding a run, and sign-off serialised with run changes. The test's
// own edition (example values: 0.5 s minimum, 0.1 s guard band, rounds of 2 then 3) makes two balls
// of 1.2 s drops (25 frames a second, read 5 → 35 by both readers) clear the limit after round 1.
let lead: Client;
let tech: Client;
let a: Client;
let b: Client;
let submissionId: string;
let reference: string;
let replacedRun: string;
let secondBallRun: string;
let secondBallSample: string;
const LOCKED = (rev: number) => `Submission ${reference} is signed off (revision ${rev}). A lead must re-open it first.`;
const message = async (res: Response, status: number) => (await json<{ error: { message: string } }>(res, status)).error.message;
const sign = () => lead.post(`/api/submissions/${submissionId}/signoff`, { password: demo.password });
const reopen = () => lead.post(`/api/submissions/${submissionId}/reopen`, { reason: "Checking what happens to a change made meanwhile." });
const results = async (id = submissionId) => json<ResultsView>(await lead.get(`/api/submissions/${id}/results`), 200);
const voidRun = (c: Client, id: string, reason: string) => c.post(`/api/runs/${id}/void`, { reason });
type RunDetail = RunView & { voidedAt?: string | null; voidReason?: string | null };
// Conditions outside the edition's surface window (20–24 °C): the run waits for a lead again.
const flagged = () => goodRun({ surfaceTemp: { value: 30, unit: "C" } });

async function readRun(runId: string): Promise<void> {
  const placed = await placeOnRun(lead, runId, { file: plainMp4() });
  for (const id of placed.dropIds) {
    await read(a, id, 5, 35);
    await read(b, id, 5, 35);
  }
}

beforeAll(async () => {
  lead = await signedIn(demo.email("lead"), demo.password);
  tech = await signedIn(demo.email("technician"), demo.password);
  const [ua, ub] = [await makeUser(["reviewer"]), await makeUser(["reviewer"])];
  [a, b] = [await signedIn(ua.email, ua.password), await signedIn(ub.email, ub.password)];
  await newEdition(lead, { effectiveFrom: "2006-03-01", minAbsorptionS: 0.5, guardBandS: 0.1, roundSizes: [2, 3], readingToleranceS: 0.5 });
  ({ id: submissionId, reference } = await newSubmission(lead, await demoOrganisationId(), { receivedOn: "2006-03-02" }));
  // Ball RC-1 was tested twice: the first run was never read, the re-test was.
  const first = await newSample(lead, submissionId, { serial: "RC-1", round: 1 });
  replacedRun = (await newRun(lead, first.id, { testedAt: new Date(Date.now() - 3_600_000).toISOString() })).id;
  await readRun((await newRun(lead, first.id)).id);
  secondBallSample = (await newSample(lead, submissionId, { serial: "RC-2", round: 1 })).id;
  secondBallRun = (await newRun(lead, secondBallSample)).id;
  await readRun(secondBallRun);
}, 240_000);
afterAll(() => closeDb());

describe("the run that counts", () => {
  it("of two runs tested in the same minute, the one recorded later counts, also after the earlier one is edited", async () => {
    const s = await newSubmission(lead, await demoOrganisationId());
    const sample = await newSample(lead, s.id, { serial: "TIE-1" });
    const testedAt = `${new Date(Date.now() - 60_000).toISOString().slice(0, 16)}:00.000Z`;
    const earlier = (await newRun(lead, sample.id, { testedAt })).id;
    const later = (await newRun(lead, sample.id, { testedAt })).id;
    expect((await results(s.id)).balls[0].runId).toBe(later);
    // Editing the earlier run rewrites its row; which run counts must not depend on where rows sit.
    await json(await lead.request("PUT", `/api/runs/${earlier}`, { json: goodRun({ testedAt, notes: "edited" }) }), 200);
    expect((await results(s.id)).balls[0].runId).toBe(later);
  });

  it("a replaced run's unsettled drops do not hold up the sign-off", async () => {
    expect(await db()("drops").where({ run_id: replacedRun }).whereIn("state", ["unread"])).toHaveLength(3);
    const r = await results();
    expect(r.decision.decision).toBe("meets limit");
    expect(r.balls.map((x) => x.runId)).not.toContain(replacedRun);
    await json(await sign(), 201);
    // The replaced run stays on record as it was.
    expect(await db()("drops").where({ run_id: replacedRun, state: "unread" })).toHaveLength(3);
  });

  it("voiding a run is refused while the submission is signed off", async () => {
    expect(await message(await voidRun(lead, replacedRun, "Recorded against the wrong ball."), 409)).toBe(LOCKED(1));
    expect((await db()("runs").where({ id: replacedRun }).first()).voided_at).toBeNull();
    await json(await reopen(), 201);
  });
});

describe("sign-off and a run change at the same moment", () => {
  it("the sign-off first: the run change waits for it, then is refused as signed off", async () => {
    const hold = await db().transaction();
    try {
      const [{ pid }] = (await hold.raw("select pg_backend_pid() as pid")).rows;
      // Holding one of the submission's drops stops the sign-off inside its transaction, after its checks.
      const drop = await db()("drops").where({ run_id: secondBallRun }).first();
      await hold("drops").where({ id: drop.id }).forUpdate();
      const signing = settles(sign());
      await blockedBehind(pid, 1, signing);
      const change = settles(lead.request("PUT", `/api/runs/${secondBallRun}`, { json: flagged() }));
      await blockedBehind(pid, 2, change);
      await hold.commit();
      expect((await signing.promise).status).toBe(201);
      expect(await message(await change.promise, 409)).toBe(LOCKED(2));
    } finally {
      if (!hold.isCompleted()) await hold.rollback();
    }
    const run = (await json<{ run: RunDetail }>(await lead.get(`/api/runs/${secondBallRun}`), 200)).run;
    expect(run.flags).toEqual([]);
    await json(await lead.post(`/api/submissions/${submissionId}/reopen`, { reason: "Checking the other order of the two." }), 201);
  });

  it("the run change first: the sign-off waits for it, then sees it and is refused", async () => {
    const hold = await db().transaction();
    try {
      const [{ pid }] = (await hold.raw("select pg_backend_pid() as pid")).rows;
      // Holding the run's row stops the change inside its transaction, before it commits.
      await hold("runs").where({ id: secondBallRun }).forUpdate();
      const change = settles(lead.request("PUT", `/api/runs/${secondBallRun}`, { json: flagged() }));
      await blockedBehind(pid, 1, change);
      const signing = settles(sign());
      await blockedBehind(pid, 2, signing);
      await hold.commit();
      expect((await change.promise).status).toBe(200);
      expect(await message(await signing.promise, 409)).toMatch(/pending/);
    } finally {
      if (!hold.isCompleted()) await hold.rollback();
    }
    expect(await db()("signatures").where({ submission_id: submissionId, revision: 3 })).toHaveLength(0);
    expect((await results()).decision.decision).toBe("pending");
    await json(await lead.request("PUT", `/api/runs/${secondBallRun}`, { json: goodRun() }), 200);
  });

  it("a run recorded while the sign-off waits is refused, and nothing is left of it", async () => {
    const hold = await db().transaction();
    const before = await db()("runs").where({ sample_id: secondBallSample });
    try {
      const [{ pid }] = (await hold.raw("select pg_backend_pid() as pid")).rows;
      const drop = await db()("drops").where({ run_id: secondBallRun }).first();
      await hold("drops").where({ id: drop.id }).forUpdate();
      const signing = settles(sign());
      await blockedBehind(pid, 1, signing);
      const recording = settles(tech.post(`/api/samples/${secondBallSample}/runs`, goodRun()));
      await blockedBehind(pid, 2, recording);
      await hold.commit();
      expect((await signing.promise).status).toBe(201);
      expect(await message(await recording.promise, 409)).toBe(LOCKED(3));
    } finally {
      if (!hold.isCompleted()) await hold.rollback();
    }
    expect(await db()("runs").where({ sample_id: secondBallSample })).toHaveLength(before.length);
    await json(await lead.post(`/api/submissions/${submissionId}/reopen`, { reason: "Back to testing for the voiding checks." }), 201);
  });
});

describe("voiding a run", () => {
  it("a re-test recorded by mistake is voided with a reason: the run before it counts again and sign-off goes through", async () => {
    const mistake = (await newRun(tech, secondBallSample)).id;
    expect((await results()).balls.find((x) => x.serial === "RC-2")?.status).toBe("pending");
    expect(await message(await sign(), 409)).toMatch(/pending|not settled/);
    expect(await message(await voidRun(lead, mistake, "short"), 422)).toBe("Please correct the form. Write the reason in a sentence (at least 10 characters).");
    expect(await message(await voidRun(tech, mistake, "Recorded on the wrong ball by mistake."), 403)).toBe("Only a lead can void a run.");
    const run = (await json<{ run: RunDetail }>(await voidRun(lead, mistake, "Recorded on the wrong ball by mistake."), 200)).run;
    expect(run).toMatchObject({
      voidReason: "Recorded on the wrong ball by mistake.",
      voidedBy: expect.any(String),
      voidedByName: expect.any(String),
      voidedAt: expect.any(String),
    });
    expect((await results()).balls.find((x) => x.serial === "RC-2")?.runId).toBe(secondBallRun);
    // Nothing is deleted: the run and its drops stay, and the change is in the audit trail.
    expect(await db()("drops").where({ run_id: mistake })).toHaveLength(3);
    const [event] = await db()("audit_events").where({ entity: "run", entity_id: mistake, action: "run.voided" });
    expect(event.after).toMatchObject({ reason: "Recorded on the wrong ball by mistake." });
    // A voided run stays voided, and its conditions no longer change.
    expect(await message(await voidRun(lead, mistake, "Voiding it a second time."), 409)).toMatch(/already voided/);
    expect(await message(await tech.request("PUT", `/api/runs/${mistake}`, { json: goodRun() }), 409)).toMatch(/voided/);
    await json(await sign(), 201);
  });

  it("a voided run's drops leave the reading queue", async () => {
    const placed = await placedDrops(lead, { file: plainMp4() });
    const queued = async () => (await json<{ items: { dropId: string }[] }>(await a.get("/api/work-queue"), 200)).items.map((i) => i.dropId);
    expect(await queued()).toEqual(expect.arrayContaining(placed.dropIds));
    await json(await voidRun(lead, placed.runId, "The clip shows another ball's test."), 200);
    expect((await queued()).filter((id) => placed.dropIds.includes(id))).toEqual([]);
    // Nor does it take new recordings: the upload is refused before anything is stored.
    const start = await lead.post(`/api/runs/${placed.runId}/clips`, { fileName: "late.mp4", contentType: "video/mp4", size: 1000 });
    expect(await message(start, 409)).toMatch(/voided.*Record a new run/);
  });

  it("the submission shows each run's void, with who, when and why", async () => {
    const detail = await json<{ rounds: { samples: { serial: string; runs: RunDetail[] }[] }[] }>(await lead.get(`/api/submissions/${submissionId}`), 200);
    const runs = detail.rounds.flatMap((r) => r.samples).find((s) => s.serial === "RC-2")!.runs;
    expect(runs.filter((r) => r.voidedAt)).toEqual([expect.objectContaining({ voidReason: "Recorded on the wrong ball by mistake." })]);
  });
});
