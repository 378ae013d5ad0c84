import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb, db } from "@/lib/db";
import { stopBoss } from "@/lib/jobs";
import { runReviewerDigest } from "@/lib/notifications/digest";
import { notifyDiscrepancy } from "@/lib/notifications/events";
import { queueMail } from "@/lib/notifications/outbox";
import { samplesRequestedMail } from "@/lib/notifications/templates";
import type { DropRow } from "@/lib/drops/queries";
import { signedIn, type Client } from "../helpers/app";
import { demo, demoOrganisationId, makeUser } from "../helpers/fixtures";
import { newRun, newSample, newSubmission } from "../helpers/intake";
import { mailsTo, waitForMail, type FakeMail } from "../helpers/mailbox";
import { enqueueAndWait, outboxTo, waitForOutboxStatus } from "../helpers/outbox";
import { json, mark, placeOnRun, read } from "../helpers/readings";

// Each person's switches for the optional notices, and the reviewers' daily digest. The digest runs
// in the real worker (the test stack sets REVIEWER_DIGEST_EVERY_SECONDS); the runs for a fixed day
// are called directly, so their counts are those of this test's own submission. Nothing sleeps: a mail
// that must not come is checked on the outbox rows once the worker has run a digest job we queued.
afterAll(async () => {
  await stopBoss();
  await closeDb();
});
const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));
/** Queues a digest run and waits until the worker has done it: every reviewer's digest of today is written by then. */
const workerDigestRun = async () => expect(await enqueueAndWait("reviewerDigest", {}, 60_000)).toBe("completed");
const today = () => new Date().toISOString().slice(0, 10);
const digestsOf = (mails: FakeMail[], day: string) => mails.filter((m) => m.subject.startsWith(`${day}:`));
type Setting = { kind: string; essential: boolean; on: boolean };
const settingsOf = async (c: Client) => (await json<{ settings: Setting[] }>(await c.get("/api/account/notifications"), 200)).settings;

describe("notification settings", () => {
  it("a person switches optional notices off and on; essential ones stay on, with a refusal in words", async () => {
    const u = await makeUser(["manufacturer"], { organisationId: (await db()("organisations").first("id")).id });
    const c = await signedIn(u.email, u.password);
    expect((await settingsOf(c)).every((s) => s.on)).toBe(true);
    const refused = await c.request("PUT", "/api/account/notifications", { json: { optOut: ["results.released"] } });
    expect(refused.status).toBe(422);
    expect(JSON.stringify((await refused.json()).error)).toContain("That notice cannot be switched off.");
    const off = await json<{ settings: Setting[] }>(
      await c.request("PUT", "/api/account/notifications", { json: { optOut: ["reviewer.digest", "discrepancy.new"] } }),
      200,
    );
    expect(
      off.settings
        .filter((s) => !s.on)
        .map((s) => s.kind)
        .sort(),
    ).toEqual(["discrepancy.new", "reviewer.digest"]);
    expect(off.settings.filter((s) => s.essential).every((s) => s.on)).toBe(true);
    await json(await c.request("PUT", "/api/account/notifications", { json: { optOut: ["discrepancy.new"] } }), 200);
    expect((await settingsOf(c)).find((s) => s.kind === "reviewer.digest")?.on).toBe(true);
  });

  it("someone who switched every optional notice off gets none of them, and still gets the essential ones", async () => {
    // Created switched off, then switched off again by the form: the worker's digest and other tests'
    // discrepancies run meanwhile and must not reach this account in between.
    const u = await makeUser(["lead", "reviewer"], { optOut: ["discrepancy.new", "reviewer.digest"] });
    const c = await signedIn(u.email, u.password);
    await json(await c.request("PUT", "/api/account/notifications", { json: { optOut: ["discrepancy.new", "reviewer.digest"] } }), 200);
    const drop = { id: crypto.randomUUID(), submissionReference: "D-OPT", sampleSerial: "B1", ordinal: 1 } as DropRow;
    await db().transaction((trx) => notifyDiscrepancy(trx, drop, 0.8));
    expect(await runReviewerDigest({ now: new Date("2091-03-04T07:00:00Z"), reviewerIds: [u.id] })).toBe(0);
    const essential = samplesRequestedMail({
      appUrl: "http://x.test",
      submissionId: crypto.randomUUID(),
      reference: "D-OPT",
      modelName: "Model",
      round: 2,
      count: 3,
      weight: "15 lb",
      dueBy: "2091-04-01",
      note: "",
    });
    const ids = await db().transaction((trx) => queueMail(trx, [{ userId: u.id, email: u.email, optOut: ["discrepancy.new", "reviewer.digest"] }], essential));
    expect(ids).toHaveLength(1);
    // The worker's own digest has had its chance (a run we queued is done), and other files'
    // discrepancies are written for leads meanwhile: still the one essential row for this account.
    await workerDigestRun();
    const rows = await outboxTo(u.email);
    expect(rows.map((r) => r.id)).toEqual(ids);
    expect(await waitForOutboxStatus(ids[0], "sent")).toMatchObject({ status: "sent", attempts: 1 });
    const [m] = await waitForMail(u.email, 1, 30_000);
    expect(m.subject).toBe("D-OPT: please send 3 more samples for round 2");
    expect((await mailsTo(u.email)).map((x) => x.subject)).toEqual([m.subject]);
  }, 60_000);
});

describe("the reviewers' daily digest", () => {
  let reference: string;
  let n: number;
  let r: { id: string; email: string };
  let skipped: { id: string; email: string };

  beforeAll(async () => {
    const tech = await signedIn(demo.email("technician"), demo.password);
    // Two balls, so there are at least four drops whatever the edition in force asks for a ball.
    const s = await newSubmission(tech, await demoOrganisationId());
    reference = s.reference;
    const drops: string[] = [];
    for (let i = 0; i < 2; i++) drops.push(...(await placeOnRun(tech, (await newRun(tech, (await newSample(tech, s.id)).id)).id)).dropIds);
    n = drops.length;
    const [ur, ux, uy, uo] = [
      await makeUser(["reviewer"], { name: "Digest Reader" }),
      await makeUser(["reviewer"]),
      await makeUser(["reviewer"]),
      await makeUser(["reviewer"], { optOut: ["reviewer.digest"] }),
    ];
    [r, skipped] = [ur, uo];
    const [cr, cx, cy] = await Promise.all([ur, ux, uy].map((u) => signedIn(u.email, u.password)));
    const [d0, d1, d2, d3] = drops;
    await read(cx, d0, 2, 20); // read once by someone else: still waiting for R
    await read(cx, d1, 2, 20);
    await read(cy, d1, 2, 20); // agreed: waits for nobody
    await read(cr, d2, 2, 20); // R's own reading is in: not waiting for R
    await mark(cr, d3, { dispenseFrame: 2 }); // R's unfinished reading: still waiting for R
  }, 300_000);

  it("counts the drops waiting for the reviewer per submission, once a day, and skips one who switched it off", async () => {
    const day = "2092-05-06";
    const at = new Date(`${day}T07:00:00Z`);
    expect(await runReviewerDigest({ now: at, reviewerIds: [r.id, skipped.id] })).toBe(1);
    expect(await runReviewerDigest({ now: at, reviewerIds: [r.id, skipped.id] })).toBe(0);
    const rows = await outboxTo(r.email, `${day}:`);
    expect(rows).toHaveLength(1);
    expect(await outboxTo(skipped.email, `${day}:`)).toEqual([]);
    expect(await waitForOutboxStatus(rows[0].id, "sent")).toMatchObject({ status: "sent", attempts: 1 });
    const end = Date.now() + 30_000;
    while (digestsOf(await mailsTo(r.email), day).length === 0 && Date.now() < end) await sleep(100);
    const mine = digestsOf(await mailsTo(r.email), day);
    expect(mine).toHaveLength(1);
    expect(mine[0].subject).toMatch(new RegExp(`^${day}: \\d+ drops? waiting for you to read$`));
    expect(mine[0].text).toContain("Hello Digest Reader,");
    expect(mine[0].text).toContain(`${reference}: ${n - 2} drop${n - 2 === 1 ? "" : "s"}`);
    expect(mine[0].text).toContain("/queue");
    // Blind: no state of any drop and nothing of another reader's work.
    expect(mine[0].text).not.toMatch(/read once|agreed|discrepanc|\d+\.\d+ s|frame/i);
    expect(await mailsTo(skipped.email)).toHaveLength(0);
  }, 60_000);

  it("the worker sends today's digest by itself, once, to a reviewer with drops waiting", async () => {
    const w = await makeUser(["reviewer"]);
    const end = Date.now() + 40_000;
    while (digestsOf(await mailsTo(w.email), today()).length === 0 && Date.now() < end) await sleep(500);
    const [first, ...more] = digestsOf(await mailsTo(w.email), today());
    expect(first?.text).toContain(`${reference}: ${n - 1} drop${n - 1 === 1 ? "" : "s"}`);
    expect(more).toHaveLength(0);
    // Two more runs by the worker, done before we look: the day's digest is not written again.
    await workerDigestRun();
    await workerDigestRun();
    const rows = await outboxTo(w.email, `${today()}:`);
    expect(rows).toHaveLength(1);
    expect(rows[0]).toMatchObject({ status: "sent", attempts: 1 });
    expect(digestsOf(await mailsTo(w.email), today())).toHaveLength(1);
    expect(await outboxTo(skipped.email, `${today()}:`)).toEqual([]);
    expect(digestsOf(await mailsTo(skipped.email), today())).toHaveLength(0);
  }, 90_000);
});
