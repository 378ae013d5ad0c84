import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb } from "@/lib/db";
import type { AgreementReport } from "@/lib/agreement/rules";
import type { DropView } from "@/lib/readings/view";
import { signedIn, type Client } from "../helpers/app";
import { demo, makeUser } from "../helpers/fixtures";
import { plainMp4 } from "../helpers/media";
import { json, mark, placedDrops, read, submit } from "../helpers/readings";

// Reviewer agreement over readings stored through the API. Expected values come from the times the
// API gave each reading (the clip's own frame times); the statistics of the whole period are
// checked against its listed points, because other tests add their own pairs to the same day.
let lead: Client;
let a: Client;
let b: Client;
let names: { a: string; b: string };
let ids: { a: string; b: string };
let settledDrops: string[];
let oneReading: string;
let draftSecond: string;
const time = (d: DropView) => d.mySubmitted!.timeS!;
const utcDay = () => new Date().toISOString().slice(0, 10);
const readDays: string[] = [];
const pairs: { dropId: string; first: number; second: number; agreed: number | null }[] = [];

async function agreement(c: Client, qs = ""): Promise<AgreementReport> {
  return (await json<{ agreement: AgreementReport }>(await c.get(`/api/agreement${qs}`), 200)).agreement;
}

beforeAll(async () => {
  const tech = await signedIn(demo.email("technician"), demo.password);
  lead = await signedIn(demo.email("lead"), demo.password);
  const [ua, ub] = [await makeUser(["reviewer"], { name: "Agreement Reader Alder" }), await makeUser(["reviewer"], { name: "Agreement Reader Birch" })];
  [a, b] = [await signedIn(ua.email, ua.password), await signedIn(ub.email, ub.password)];
  names = { a: ua.name, b: ub.name };
  ids = { a: ua.id, b: ub.id };
  readDays.push(utcDay());
  const run1 = (await placedDrops(tech, { file: plainMp4(undefined, 4) })).dropIds;
  const run2 = (await placedDrops(tech, { file: plainMp4(undefined, 4) })).dropIds;
  settledDrops = run1;

  // Drop 1: the first reader corrects their reading before the second reads; the correction counts.
  const old = (await read(a, run1[0], 2, 20)).mySubmitted!.id;
  const draft = (await json<{ drop: DropView }>(await a.post(`/api/readings/${old}/corrections`, { reason: "Marked the clear frame far too early." }), 201))
    .drop.myDraft!;
  await json(await a.patch(`/api/readings/${draft.id}`, { clearFrame: 40 }), 200);
  const corrected = await submit(a, draft.id);
  // Marks per drop (first reader, second reader): one frame apart, six frames apart, thirty apart.
  const plan: [string, DropView, [number, number]][] = [
    [run1[0], corrected, [3, 40]],
    [run1[1], await read(a, run1[1], 2, 50), [2, 56]],
    [run1[2], await read(a, run1[2], 2, 30), [2, 60]],
  ];
  for (const [dropId, first, [d, c]] of plan) {
    const second = await read(b, dropId, d, c);
    expect(second.blind).toBe(false);
    pairs.push({ dropId, first: time(first), second: time(second), agreed: second.comparison!.agreedTimeS });
  }
  expect(pairs.map((p) => p.agreed === null)).toEqual([false, false, true]);
  readDays.push(utcDay());

  // Run 2: one drop read once; one with the second reading still a draft.
  oneReading = run2[0];
  await read(a, oneReading, 2, 40);
  draftSecond = run2[1];
  await read(a, draftSecond, 2, 40);
  await mark(b, draftSecond, { dispenseFrame: 2, clearFrame: 41 });
}, 180_000);
afterAll(() => closeDb());

describe("GET /api/agreement", () => {
  it("lists each settled drop at the mean of its two current readings and first − second", async () => {
    const r = await agreement(lead);
    for (const p of pairs) {
      const point = r.points.find((x) => x.dropId === p.dropId);
      expect(point, p.dropId).toBeDefined();
      expect(point!.meanS).toBeCloseTo((p.first + p.second) / 2, 12);
      expect(point!.differenceS).toBeCloseTo(p.first - p.second, 12);
    }
    // The corrected reading counts, not the one it replaced (clear frame 40, not 20).
    expect(pairs[0].first).toBeGreaterThan(1.4);
    expect(r.points.find((x) => x.dropId === pairs[0].dropId)!.differenceS).toBeCloseTo(pairs[0].first - pairs[0].second, 12);
  });

  it("counts n and the Bland–Altman figures over exactly the points it lists", async () => {
    const r = await agreement(lead);
    expect(r.n).toBe(r.points.length);
    expect(r.n).toBeGreaterThanOrEqual(3);
    const diffs = r.points.map((p) => p.differenceS);
    const mean = diffs.reduce((s, d) => s + d, 0) / diffs.length;
    const sd = Math.sqrt(diffs.reduce((s, d) => s + (d - mean) ** 2, 0) / (diffs.length - 1));
    // Bland & Altman (1986), Lancet 1(8476):307–310: limits are bias ± 1.96 sd of the differences.
    expect(r.statistics!.biasS).toBeCloseTo(mean, 12);
    expect(r.statistics!.sdS).toBeCloseTo(sd, 12);
    expect(r.statistics!.lowerS).toBeCloseTo(mean - 1.96 * sd, 12);
    expect(r.statistics!.upperS).toBeCloseTo(mean + 1.96 * sd, 12);
  });

  it("gives each reviewer's bias against the agreed value over the drops that have one", async () => {
    const r = await agreement(lead);
    const agreed = pairs.filter((p) => p.agreed !== null);
    for (const [who, pick] of [
      ["a", (p: (typeof pairs)[number]) => p.first],
      ["b", (p: (typeof pairs)[number]) => p.second],
    ] as const) {
      const diffs = agreed.map((p) => pick(p) - p.agreed!);
      const mean = (diffs[0] + diffs[1]) / 2;
      const sd = Math.abs(diffs[0] - diffs[1]) / Math.SQRT2; // two values: sd = |x₁ − x₂| / √2
      const row = r.reviewers.find((x) => x.reviewerId === ids[who])!;
      expect(row).toMatchObject({ reviewerName: names[who], n: 2 });
      expect(row.meanS).toBeCloseTo(mean, 12);
      expect(row.sdS).toBeCloseTo(sd, 12);
    }
  });

  it("puts the thirty-frame disagreement among the largest, with both reviewers' names", async () => {
    const r = await agreement(lead);
    const wide = r.largest.find((x) => x.dropId === pairs[2].dropId);
    expect(wide).toMatchObject({ first: { reviewerName: names.a }, second: { reviewerName: names.b }, agreedS: null });
    expect(wide!.differenceS).toBeCloseTo(pairs[2].first - pairs[2].second, 12);
  });

  it("leaves out a drop read once and one whose second reading is a draft", async () => {
    const text = JSON.stringify(await agreement(lead));
    expect(text).not.toContain(oneReading);
    expect(text).not.toContain(draftSecond);
    for (const d of settledDrops) expect(text).toContain(d);
  });

  it("counts a drop in the UTC days of its later reading, both ends included", async () => {
    // The readings were all made on one UTC day unless the set-up ran across midnight.
    if (readDays[0] === readDays[1]) {
      const day = readDays[0];
      const r = await agreement(lead, `?from=${day}&to=${day}`);
      expect(r.points.map((p) => p.dropId)).toEqual(expect.arrayContaining(settledDrops));
    }
    const past = await agreement(lead, "?from=2001-01-01&to=2001-01-31");
    expect(past).toMatchObject({ from: "2001-01-01", to: "2001-01-31", n: 0, statistics: null, points: [] });
    expect(past.reason).toMatch(/No drop in this period/);
  });

  it("refuses anyone but a lead", async () => {
    for (const c of [a, await signedIn(demo.email("technician"), demo.password)]) {
      const body = await json(await c.get("/api/agreement"), 403);
      expect(body.error.message).toMatch(/lead/);
    }
  });

  it("refuses bad dates with words, field by field", async () => {
    const bad = await json(await lead.get("/api/agreement?from=2026-02-30&to=2026-03-01"), 422);
    expect(bad.error.fields.from).toBe("The first day must be a date (YYYY-MM-DD).");
    const reversed = await json(await lead.get("/api/agreement?from=2026-03-02&to=2026-03-01"), 422);
    expect(reversed.error.fields.from).toBe("The first day must not be after the last day.");
    expect((await json(await lead.get("/api/agreement?to=yesterday"), 422)).error.fields.to).toMatch(/last day must be a date/);
  });
});
