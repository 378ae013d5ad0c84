import { mkdtempSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb, db } from "@/lib/db";
import type { DropView } from "@/lib/readings/view";
import { renderSyntheticClip, type Truth } from "@/scripts/clips/synth-clip";
import { signedIn, type Client } from "../helpers/app";
import { demo, makeUser } from "../helpers/fixtures";
import { json, mark, placedDrops, read, submit } from "../helpers/readings";

// Readings through the real API on a synthetic clip whose true dispense and clear frames are known:
// the clip runs at 30000/1001 with a variable rate and a first timestamp of 3.5 s, so any time taken
// from frame number ÷ nominal rate, or from zero, would be wrong.
let tech: Client;
let lead: Client;
let a: Client;
let b: Client;
let truth: Truth;
let dropIds: string[];
let clipId: string;
const dir = mkdtempSync(path.join(process.env.TEST_TMP_DIR ?? os.tmpdir(), "wickmark-readings-"));
const seconds = (ticks: number) => (ticks * truth.video.timeBase.num) / truth.video.timeBase.den;

beforeAll(async () => {
  tech = await signedIn(demo.email("technician"), demo.password);
  lead = await signedIn(demo.email("lead"), demo.password);
  const [ua, ub] = [await makeUser(["reviewer"]), await makeUser(["reviewer"])];
  [a, b] = [await signedIn(ua.email, ua.password), await signedIn(ub.email, ub.password)];
  const r = await renderSyntheticClip({
    out: path.join(dir, "drops.mp4"),
    width: 320,
    height: 180,
    length: 9,
    drops: 3,
    durations: [1.9, 2.3, 1.7],
    fps: "30000/1001",
    vfr: true,
    start: 3.5,
    noise: 4,
  });
  truth = r.truth;
  ({ dropIds, clipId } = await placedDrops(tech, { file: r.file, startFrame: truth.drops[0].dispenseFrame }));
}, 120_000);
afterAll(() => closeDb());

describe("two reviewers read a drop", () => {
  it("marks on the true frames give exactly the clip's pts difference, and two such readings agree", async () => {
    const t = truth.drops[0];
    const first = await read(a, dropIds[0], t.dispenseFrame, t.clearFrame);
    expect(first.mySubmitted).toMatchObject({ dispensePts: t.dispensePts, clearPts: t.clearPts, timeS: seconds(t.clearPts - t.dispensePts) });
    expect(first.mySubmitted!.timeS).toBeCloseTo(t.frameDuration, 9); // the truth file keeps 9 decimals
    // GUM 4.3.7: each mark rectangular over its frame's interval Δ, so u = √((Δ₁² + Δ₂²)/12) (= Δ/√6 for
    // equal intervals), and U = 2u (GUM 6.2). Intervals from the clip's own index (variable rate):
    // the interval before each marked frame, since a mark is the first frame showing its event.
    const { pts } = await json<{ pts: number[] }>(await a.get(`/api/clips/${clipId}/frames`), 200);
    const [d1, d2] = [t.dispenseFrame, t.clearFrame].map((f) => seconds(pts[f] - pts[f - 1]));
    const u = first.mySubmitted!.uncertainty!;
    expect(u.standard).toBeCloseTo(Math.sqrt((d1 ** 2 + d2 ** 2) / 12), 12);
    expect(u.expanded).toBeCloseTo(2 * u.standard, 12);
    expect(first).toMatchObject({ blind: true, state: null });

    const second = await read(b, dropIds[0], t.dispenseFrame, t.clearFrame);
    expect(second).toMatchObject({ blind: false, state: "agreed" });
    expect(second.comparison).toEqual({ agreedTimeS: seconds(t.clearPts - t.dispensePts), timeDifferenceS: 0, dispenseDifferenceS: 0, clearDifferenceS: 0 });
    expect(second.readings.map((r) => r.slot).sort()).toEqual([1, 2]);
  });

  it("a second pair that disagrees beyond the tolerance becomes a discrepancy in the leads' queue", async () => {
    const t = truth.drops[1];
    await read(a, dropIds[1], t.dispenseFrame, t.clearFrame);
    // 0.5 s tolerance (demo edition); 30 frames late is about a second.
    const late = await read(b, dropIds[1], t.dispenseFrame, t.clearFrame + 30);
    expect(late.state).toBe("discrepancy");
    expect(late.comparison!.agreedTimeS).toBeNull();
    expect(late.comparison!.timeDifferenceS).toBeGreaterThan(0.5);
    const { drops } = await json<{ drops: DropView[] }>(await lead.get("/api/discrepancies"), 200);
    expect(drops.map((d) => d.id)).toContain(dropIds[1]);
  });

  it("the same reviewer cannot give the second reading", async () => {
    const t = truth.drops[2];
    await read(a, dropIds[2], t.dispenseFrame, t.clearFrame);
    const again = await a.post(`/api/drops/${dropIds[2]}/readings`, { dispenseFrame: t.dispenseFrame });
    expect(again.status).toBe(409);
    expect((await again.json()).error.message).toMatch(/already read this drop.*another reviewer/);
  });
});

describe("what a reviewer's reading cannot be", () => {
  let drops: string[];
  let c: Client;
  beforeAll(async () => {
    drops = (await placedDrops(tech)).dropIds;
    const u = await makeUser(["reviewer"]);
    c = await signedIn(u.email, u.password);
  }, 60_000);

  it("refuses each bad mark with its reason", async () => {
    const cases: [Record<string, number>, RegExp][] = [
      [{ dispenseFrame: 20, clearFrame: 10 }, /clear frame \(10\) must come after the dispense frame \(20\)/],
      [{ dispenseFrame: 20, clearFrame: 20 }, /must come after/],
      [{ dispenseFrame: 5, clearFrame: 5000 }, /clear frame 5000 is outside the clip, which has frames 0 to \d+/],
      [{ dispenseFrame: 9999 }, /dispense frame 9999 is outside the clip/],
    ];
    for (const [body, reason] of cases) {
      const res = await c.post(`/api/drops/${drops[0]}/readings`, body);
      expect(res.status).toBe(422);
      expect((await res.json()).error.message).toMatch(reason);
    }
    const neg = await c.post(`/api/drops/${drops[0]}/readings`, { dispenseFrame: -1 });
    expect((await json(neg, 422)).error.fields.dispenseFrame).toMatch(/below frame 0/);
  });

  it("refuses to submit with one mark, and refuses marks once the clip is rejected", async () => {
    const d = await mark(c, drops[1], { dispenseFrame: 3 });
    expect((await json(await c.post(`/api/readings/${d.myDraft!.id}/submit`), 422)).error.message).toMatch(/Mark both/);
    // A clip that has been rejected as evidence (set directly: no screen rejects a ready clip yet).
    const other = await placedDrops(tech);
    await db()("clips").where({ id: other.clipId }).update({ status: "rejected", reject_reason: "the camera was moved during the run" });
    const res = await c.post(`/api/drops/${other.dropIds[0]}/readings`, { dispenseFrame: 1 });
    expect(res.status).toBe(409);
    expect((await res.json()).error.message).toMatch(/clip was rejected \(the camera was moved during the run\)/);
  });

  it("keeps a submitted reading as it is: no change, no discard, not even in the database", async () => {
    const d = await read(c, drops[2], 2, 30);
    const id = d.mySubmitted!.id;
    expect((await json(await c.patch(`/api/readings/${id}`, { clearFrame: 31 }), 409)).error.message).toMatch(/submitted and cannot change/);
    expect((await json(await c.request("DELETE", `/api/readings/${id}`), 409)).error.message).toMatch(/kept for good/);
    await expect(db()("readings").where({ id }).update({ clear_frame: 31 })).rejects.toThrow(/cannot be changed or deleted/);
    await expect(db()("readings").where({ id }).delete()).rejects.toThrow(/cannot be changed or deleted/);
    expect((await json(await c.get(`/api/readings/${id}`), 200)).reading).toMatchObject({ clearFrame: 30, status: "submitted" });
  });

  it("a correction is a new reading with a reason; the old one stays, shown as superseded", async () => {
    const d = await read(c, drops[0], 2, 25);
    const old = d.mySubmitted!.id;
    expect((await json(await c.post(`/api/readings/${old}/corrections`, { reason: "typo" }), 422)).error.fields.reason).toMatch(/at least 10/);
    const started = await json<{ drop: DropView }>(
      await c.post(`/api/readings/${old}/corrections`, { reason: "Marked the clear frame a few frames early." }),
      201,
    );
    const draft = started.drop.myDraft!;
    expect(draft).toMatchObject({ supersedesId: old, clearFrame: 25, correctionReason: "Marked the clear frame a few frames early." });
    await json(await c.patch(`/api/readings/${draft.id}`, { clearFrame: 28 }), 200);
    const after = await submit(c, draft.id);
    expect(after.mySubmitted).toMatchObject({ id: draft.id, clearFrame: 28 });
    expect(after.readings.find((r) => r.id === old)).toMatchObject({ superseded: true, clearFrame: 25 });
    expect(after.state).toBeNull();
  });

  it("once both readings are in, a reader can no longer correct", async () => {
    const settled = (await json<{ drop: DropView }>(await a.get(`/api/drops/${dropIds[0]}`), 200)).drop;
    const res = await a.post(`/api/readings/${settled.mySubmitted!.id}/corrections`, { reason: "Second thoughts about the clear frame." });
    expect((await json(res, 409)).error.message).toMatch(/Both readings of this drop are in/);
  });
});

describe("drop placement", () => {
  it("places a drop on a ready clip of its run, and refuses frames past the end or someone else's clip", async () => {
    const here = await placedDrops(tech);
    const there = await placedDrops(tech);
    const put = (dropId: string, body: unknown) => tech.request("PUT", `/api/drops/${dropId}/placement`, { json: body });
    expect((await json(await put(here.dropIds[0], { clipId: here.clipId, startFrame: 100000 }), 422)).error.fields.startFrame).toMatch(/past its end/);
    expect((await json(await put(here.dropIds[0], { clipId: there.clipId, startFrame: 1 }), 422)).error.fields.clipId).toMatch(/this run's clips/);
    const placed = (await json<{ drop: DropView }>(await put(here.dropIds[0], { clipId: here.clipId, startFrame: 7 }), 200)).drop;
    expect(placed).toMatchObject({ startFrame: 7, clip: { id: here.clipId, status: "ready" }, state: "unread", blind: false });
    await mark(a, here.dropIds[0], { dispenseFrame: 7 });
    expect((await json(await put(here.dropIds[0], { clipId: here.clipId, startFrame: 9 }), 409)).error.message).toMatch(/Reading of this drop has begun/);
    const reviewerTry = await b.request("PUT", `/api/drops/${here.dropIds[1]}/placement`, { json: { clipId: here.clipId, startFrame: 1 } });
    expect(reviewerTry.status).toBe(403);
  }, 60_000);

  it("a placer who also reads may not move a placed drop, whether or not reading has begun", async () => {
    const r = await placedDrops(tech);
    await mark(a, r.dropIds[0], { dispenseFrame: 1 });
    const move = (dropId: string) => lead.request("PUT", `/api/drops/${dropId}/placement`, { json: { clipId: r.clipId, startFrame: 2 } });
    const [read, unread] = [await json(await move(r.dropIds[0]), 409), await json(await move(r.dropIds[1]), 409)];
    expect(read.error.message).toBe(unread.error.message);
    expect(read.error.message).toMatch(/Because you also read drops/);
  }, 60_000);

  it("refuses a drop that is not placed yet", async () => {
    const r = await placedDrops(tech);
    const unplaced = (await db()("drops").insert({ run_id: r.runId, ordinal: 9 }).returning("id"))[0].id;
    expect((await json(await a.post(`/api/drops/${unplaced}/readings`, { dispenseFrame: 1 }), 409)).error.message).toMatch(/not placed on a clip yet/);
  }, 60_000);

  it("a technician, who does not read drops, sees the clip in use", async () => {
    const d = (await json<{ drop: DropView }>(await tech.get(`/api/drops/${dropIds[1]}`), 200)).drop;
    expect(d.clip!.id).toBe(clipId);
    expect(d.state).toBe("discrepancy");
  });
});
