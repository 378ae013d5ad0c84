import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb, db } from "@/lib/db";
import type { ResultsView } from "@/lib/results/view";
import type { SignOffView } from "@/lib/signoff/service";
import { signedIn, type Client } from "../helpers/app";
import { demo, demoOrganisationId, makeUser } from "../helpers/fixtures";
import { goodRun, newEdition, newRun, newSample, newSubmission } from "../helpers/intake";
import { plainMp4 } from "../helpers/media";
import { json, placeOnRun, read } from "../helpers/readings";

// Signing results off, the lock it puts on the submission, and re-opening it as revision 2. The
// clip is 25 frames a second; the test's own edition (example values: 0.5 s minimum, 0.1 s guard
// band, rounds of 2 then 3) makes two balls of 1.2 s drops clear the limit after round 1.
let lead: Client;
let tech: Client;
let a: Client;
let b: Client;
let submissionId: string;
let reference: string;
let runId: string;
let drops: string[] = [];
const LOCKED = (rev: number) => `Submission ${reference} is signed off (revision ${rev}). A lead must re-open it first.`;
const message = async (res: Response, status: number) => (await json<{ error: { message: string } }>(res, status)).error.message;

async function ball(serial: string): Promise<{ runId: string; dropIds: string[] }> {
  const sample = await newSample(lead, submissionId, { serial, round: 1 });
  const placed = await placeOnRun(lead, (await newRun(lead, sample.id)).id, { file: plainMp4() });
  for (const id of placed.dropIds) {
    await read(a, id, 5, 35);
    await read(b, id, 5, 35);
  }
  return placed;
}
const sign = (password: string) => lead.post(`/api/submissions/${submissionId}/signoff`, { password });

beforeAll(async () => {
  lead = await signedIn(demo.email("lead"), demo.password);
  tech = await signedIn(demo.email("technician"), demo.password);
  const [ua, ub] = [await makeUser(["reviewer"]), await makeUser(["reviewer"])];
  [a, b] = [await signedIn(ua.email, ua.password), await signedIn(ub.email, ub.password)];
  await newEdition(lead, { effectiveFrom: "2004-03-01", minAbsorptionS: 0.5, guardBandS: 0.1, roundSizes: [2, 3], readingToleranceS: 0.5 });
  ({ id: submissionId, reference } = await newSubmission(lead, await demoOrganisationId(), { receivedOn: "2004-03-02" }));
  const first = await ball("SO-1");
  runId = first.runId;
  drops = [...first.dropIds, ...(await ball("SO-2")).dropIds];
}, 180_000);
afterAll(() => closeDb());

describe("signing off a submission's results", () => {
  it("refuses a wrong password and signs nothing", async () => {
    const r = await json<ResultsView>(await lead.get(`/api/submissions/${submissionId}/results`), 200);
    expect(r.decision.decision).toBe("meets limit");
    expect(await message(await sign("not my password"), 422)).toMatch(/password is not right/);
    expect(await db()("signatures").where({ submission_id: submissionId })).toHaveLength(0);
  });

  it("signs with the password: released, drops signed off, the results kept as they were", async () => {
    const { signOff } = await json<{ signOff: SignOffView }>(await sign(demo.password), 201);
    expect(signOff).toMatchObject({ revision: 1, locked: true });
    expect(signOff.signatures).toEqual([expect.objectContaining({ revision: 1, meaning: "results reviewed and released", changes: null })]);
    expect((await db()("submissions").where({ id: submissionId }).first()).status).toBe("released");
    expect(new Set((await db()("drops").whereIn("id", drops)).map((d) => d.state))).toEqual(new Set(["signed off"]));
    const [row] = await db()("signatures").where({ submission_id: submissionId });
    expect(row.results.decision.decision).toBe("meets limit");
    expect(await db()("audit_events").where({ entity: "submission", entity_id: submissionId, action: "submission.signed_off" })).toHaveLength(1);
    // Every member of staff sees the lock on the submission itself.
    expect((await json<{ signOff: unknown }>(await tech.get(`/api/submissions/${submissionId}`), 200)).signOff).toEqual({ revision: 1, locked: true });
  });

  it("once signed, readings, placement, runs, samples and new clips are refused with the reason", async () => {
    const reviewer = await makeUser(["reviewer"]);
    const c = await signedIn(reviewer.email, reviewer.password);
    expect(await message(await c.post(`/api/drops/${drops[0]}/readings`, { dispenseFrame: 1 }), 409)).toBe(LOCKED(1));
    const clipId = (await db()("drops").where({ id: drops[0] }).first()).clip_id;
    expect(await message(await tech.request("PUT", `/api/drops/${drops[0]}/placement`, { json: { clipId, startFrame: 1 } }), 409)).toBe(LOCKED(1));
    expect(await message(await lead.request("PUT", `/api/runs/${runId}`, { json: goodRun() }), 409)).toBe(LOCKED(1));
    expect(
      await message(
        await lead.post(`/api/submissions/${submissionId}/samples`, {
          serial: "SO-9",
          weight: { value: 7000, unit: "g" },
          receivedAt: new Date().toISOString(),
        }),
        409,
      ),
    ).toBe(LOCKED(1));
    const clipsBefore = await db()("clips").where({ run_id: runId }).count<{ count: string }[]>("* as count");
    expect(await message(await tech.post(`/api/runs/${runId}/clips`, { fileName: "late.mp4", size: 1000, contentType: "video/mp4" }), 409)).toBe(LOCKED(1));
    expect(await db()("clips").where({ run_id: runId }).count<{ count: string }[]>("* as count")).toEqual(clipsBefore);
    expect(await message(await sign(demo.password), 409)).toMatch(/already signed off/);
  });

  it("re-opening needs a reason, starts revision 2, and the next signature records what changed", async () => {
    expect(await message(await lead.post(`/api/submissions/${submissionId}/reopen`, { reason: "short" }), 422)).toBe(
      "Please correct the form. Write the reason for re-opening in a sentence (at least 10 characters).",
    );
    const { signOff } = await json<{ signOff: SignOffView }>(
      await lead.post(`/api/submissions/${submissionId}/reopen`, { reason: "A third ball arrived and is to be included." }),
      201,
    );
    expect(signOff).toMatchObject({
      revision: 2,
      locked: false,
      reopenings: [expect.objectContaining({ revision: 2, reason: "A third ball arrived and is to be included.", reopenedBy: expect.any(String) })],
    });
    expect((await json<{ signOff: unknown }>(await lead.get(`/api/submissions/${submissionId}`), 200)).signOff).toEqual({ revision: 2, locked: false });
    expect((await db()("submissions").where({ id: submissionId }).first()).status).toBe("testing");
    expect(new Set((await db()("drops").whereIn("id", drops)).map((d) => d.state))).toEqual(new Set(["agreed"]));
    await ball("SO-3");
    const second = (await json<{ signOff: SignOffView }>(await sign(demo.password), 201)).signOff;
    expect(second).toMatchObject({ revision: 2, locked: true });
    expect(second.signatures[1].changes).toMatchObject({ ballsAdded: ["SO-3"], ballsRemoved: [], decision: null });
    expect(await message(await lead.request("PUT", `/api/runs/${runId}`, { json: goodRun() }), 409)).toBe(LOCKED(2));
  });
});
