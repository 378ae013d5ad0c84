import { mean, sampleStandardDeviation } from "simple-statistics";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb, db } from "@/lib/db";
import { listOrganisations } from "@/lib/organisations/queries";
import type { ResultsView } from "@/lib/results/view";
import { toleranceFactor } from "@/lib/stats";
import { signedIn, type Client } from "../helpers/app";
import { demo, makeUser } from "../helpers/fixtures";
import { newEdition, newRun, newSample, newSubmission } from "../helpers/intake";
import { plainMp4 } from "../helpers/media";
import { json, placeOnRun, read } from "../helpers/readings";

// Results from readings stored through the API. The clip runs at exactly 25 fps, so a reading from
// frame 5 to frame 5 + k takes k/25 s. The edition is the test's own, with limits to suit 4 s clips:
// 2.0 s minimum, 0.3 s guard band, rounds of 2 then 3, 90 %/95 % tolerance (example values).
let lead: Client;
let a: Client;
let b: Client;
let submissionId: string;
let organisationId: string;
let otherOrganisationId: string;
const FRAME = 1 / 25;

async function ball(serial: string, round: number, clearFrames: number[], opts: { leaveLastOpen?: boolean } = {}): Promise<string[]> {
  const sample = await newSample(lead, submissionId, { serial, round });
  const { dropIds } = await placeOnRun(lead, (await newRun(lead, sample.id)).id, { file: plainMp4(undefined, 4) });
  for (const [i, clear] of clearFrames.entries()) {
    await read(a, dropIds[i], 5, clear);
    if (opts.leaveLastOpen && i === clearFrames.length - 1) continue;
    await read(b, dropIds[i], 5, clear);
  }
  return dropIds;
}
const results = async (c: Client = lead) => json<ResultsView>(await c.get(`/api/submissions/${submissionId}/results`), 200);

beforeAll(async () => {
  lead = await signedIn(demo.email("lead"), demo.password);
  const [ua, ub] = [await makeUser(["reviewer"]), await makeUser(["reviewer"])];
  [a, b] = [await signedIn(ua.email, ua.password), await signedIn(ub.email, ub.password)];
  // The only edition in force on 2001-01-02, so the submission received that day is judged by it.
  await newEdition(lead, { effectiveFrom: "2001-01-01", minAbsorptionS: 2.0, guardBandS: 0.3, roundSizes: [2, 3], readingToleranceS: 0.5 });
  const orgs = await listOrganisations(db());
  [organisationId, otherOrganisationId] = [orgs[0].id, orgs[1].id];
  submissionId = (await newSubmission(lead, organisationId, { receivedOn: "2001-01-02" })).id;
}, 60_000);
afterAll(() => closeDb());

describe("results of a submission read through the API", () => {
  let openDrop: string;

  it("after round 1 a ball inside the guard band asks for round 2 of 3", async () => {
    await ball("R1-A", 1, [75, 76, 77]); // 2.80, 2.84, 2.88 s
    await ball("R1-B", 1, [58, 59, 60]); // 2.12, 2.16, 2.20 s: inside 2.0–2.3 s
    const r = await results();
    expect(r.edition).toMatchObject({ minAbsorptionS: 2, guardBandS: 0.3, roundSizes: [2, 3] });
    const [A, B] = r.balls;
    expect(A).toMatchObject({ serial: "R1-A", n: 3, status: "meets" });
    expect(A.mean).toBeCloseTo(71 * FRAME, 9);
    expect(A.sd).toBeCloseTo(FRAME, 9);
    expect(A.range).toBeCloseTo(2 * FRAME, 9);
    expect(B).toMatchObject({ serial: "R1-B", status: "close" });
    expect(A.drops[0]).toMatchObject({ settled: true, readers: expect.arrayContaining([expect.any(String)]) });
    expect(A.drops[0].readers).toHaveLength(2);
    // One frame at 25 fps: U = 2·Δ/√6 (GUM 4.3.7 and 6.2).
    expect(A.drops[0].uncertaintyS).toBeCloseTo((2 * FRAME) / Math.sqrt(6), 9);
    expect(r.decision).toMatchObject({ decision: "close to limit — more samples", round: 1, closeBalls: ["R1-B"], nextRound: { round: 2, size: 3 } });
    expect(r.decision.explanation).toBe(
      "After round 1: 1 of 2 balls is close to the 2 s minimum, inside its 0.3 s guard band: R1-B (2.2 s). Round 2 asks for 3 more samples.",
    );
  }, 300_000);

  it("waits while a drop of round 2 has one reading, and says nothing of that reading", async () => {
    await ball("R2-C", 2, [70, 71, 72]);
    await ball("R2-D", 2, [65, 66, 67]);
    const ids = await ball("R2-E", 2, [67, 68, 69], { leaveLastOpen: true });
    openDrop = ids[2];
    const r = await results();
    const E = r.balls.find((x) => x.serial === "R2-E")!;
    expect(E).toMatchObject({ status: "pending", pendingReason: "2 of 3 drops settled", mean: null });
    expect(E.drops[2]).toEqual({ id: openDrop, ordinal: 3, settled: false, timeS: null, uncertaintyS: null, readers: [], outlier: false });
    expect(r.decision).toMatchObject({ decision: "pending", round: 2, pendingBalls: ["R2-E"] });
    // A reviewer who has not read that drop sees the same, since nothing in it depends on the first reading.
    const c = await makeUser(["reviewer"]);
    expect((await results(await signedIn(c.email, c.password))).balls.find((x) => x.serial === "R2-E")!.drops[2]).toEqual(E.drops[2]);
  }, 300_000);

  it("once every round is in, the lower tolerance limit decides", async () => {
    await read(b, openDrop, 5, 69);
    const r = await results();
    const means = r.balls.map((x) => x.mean!);
    // Mean and SD of the ball means from a general-purpose library (simple-statistics).
    const [m, s] = [mean(means), sampleStandardDeviation(means)];
    const k = toleranceFactor(5, 0.9, 0.95);
    expect(r.decision.tolerance).toMatchObject({ n: 5, coverage: 0.9, confidence: 0.95 });
    expect(r.decision.tolerance!.mean).toBeCloseTo(m, 9);
    expect(r.decision.tolerance!.sd).toBeCloseTo(s, 9);
    expect(r.decision.tolerance!.limit).toBeCloseTo(m - k * s, 9);
    expect(r.decision).toMatchObject({ decision: "below limit", decidedBy: "tolerance limit", finalRound: true });
    expect(r.decision.explanation).toMatch(
      /^5 balls; lower 90 %\/95 % tolerance limit 1\.\d s is below the 2 s minimum; estimated fraction of balls below the minimum [\d.]+ %\.$/,
    );
  }, 60_000);

  it("is refused to the manufacturer until released, and to anyone outside the lab's submission as not found", async () => {
    const own = await makeUser(["manufacturer"], { organisationId });
    const res = await (await signedIn(own.email, own.password)).get(`/api/submissions/${submissionId}/results`);
    expect(res.status).toBe(403);
    expect((await res.json()).error.message).toBe("The lab shows results to the manufacturer once a lead has released them.");
    // Another organisation's manufacturer is told, as for a missing one, that there is no such submission.
    const other = await makeUser(["manufacturer"], { organisationId: otherOrganisationId });
    const hidden = await (await signedIn(other.email, other.password)).get(`/api/submissions/${submissionId}/results`);
    const missing = await lead.get("/api/submissions/00000000-0000-0000-0000-000000000000/results");
    // A malformed id is the same "no such submission", never a database error.
    const malformed = await lead.get("/api/submissions/not-an-id/results");
    expect(malformed.status).toBe(404);
    expect([hidden.status, missing.status]).toEqual([404, 404]);
    expect((await hidden.json()).error.message).toBe((await missing.json()).error.message);
  });
});
