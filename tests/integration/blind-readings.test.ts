import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb } from "@/lib/db";
import { signedIn, type Client } from "../helpers/app";
import { demo, makeUser } from "../helpers/fixtures";
import { json, mark, placedDrops, read } from "../helpers/readings";

// Blind second reading: until both readings of a drop are submitted, nothing a reviewer gets back
// may carry the other reading's marks or times, or even tell whether it exists. The proof: drop X
// has another reviewer's submitted reading, drop Y has none, and every response the second reviewer
// gets about X equals the one about Y once the drops' own ids and timestamps are set aside.
let tech: Client;
let first: Client;
let firstUser: { id: string; name: string };
let firstReadingId: string;
let runId: string;
let submissionId: string;
let x: string;
let y: string;
const observers: [string, Client][] = [];

beforeAll(async () => {
  tech = await signedIn(demo.email("technician"), demo.password);
  const placed = await placedDrops(tech);
  runId = placed.runId;
  [x, y] = placed.dropIds;
  const fu = await makeUser(["reviewer"], { name: "First Reader Ashdown" });
  first = await signedIn(fu.email, fu.password);
  firstUser = { id: fu.id, name: fu.name };
  firstReadingId = (await read(first, x, 3, 31)).mySubmitted!.id;
  submissionId = (await json(await tech.get(`/api/runs/${runId}`), 200)).run.submissionId;
  for (const roles of [["reviewer"], ["lead", "reviewer"], ["technician", "reviewer"]] as const) {
    const u = await makeUser([...roles]);
    observers.push([roles.join("+"), await signedIn(u.email, u.password)]);
  }
}, 90_000);
afterAll(() => closeDb());

/** Sets aside what legitimately differs between two drops: their ids, ordinals and times. */
function normalised(value: unknown, ids: string[]): unknown {
  const text = JSON.stringify(value)
    .replaceAll(new RegExp(ids.join("|"), "g"), "<id>")
    .replace(/"ordinal":\d+/g, '"ordinal":0')
    .replace(/"\d{4}-\d\d-\d\dT[\d:.]+Z"/g, '"<time>"')
    .replace(/"(id|myDraftId)":"[0-9a-f-]{36}"/g, '"$1":"<uuid>"');
  return JSON.parse(text);
}

function expectNothingOfTheFirstReading(body: unknown) {
  const text = JSON.stringify(body);
  for (const secret of [firstReadingId, firstUser.id, firstUser.name, '"clearFrame":31']) expect(text).not.toContain(secret);
  expect(text).not.toMatch(/"slot":[12]/);
}

describe("blind second reading, for every endpoint that returns drops or readings", () => {
  it("GET /api/drops/:id, /api/runs/:id/drops and /api/work-queue say the same of a read drop as of an unread one", async () => {
    for (const [who, c] of observers) {
      const [dx, dy] = [await json(await c.get(`/api/drops/${x}`), 200), await json(await c.get(`/api/drops/${y}`), 200)];
      expect(normalised(dx, [x]), who).toEqual(normalised(dy, [y]));
      expect(dx.drop).toMatchObject({ blind: true, state: null, readings: [], comparison: null });
      expectNothingOfTheFirstReading(dx);

      const list = (await json(await c.get(`/api/runs/${runId}/drops`), 200)).drops as { id: string }[];
      const [lx, ly] = [list.find((d) => d.id === x), list.find((d) => d.id === y)];
      expect(normalised(lx, [x]), who).toEqual(normalised(ly, [y]));
      expectNothingOfTheFirstReading(list);

      const queue = (await json(await c.get("/api/work-queue"), 200)).items as { dropId: string }[];
      const [qx, qy] = [queue.find((i) => i.dropId === x), queue.find((i) => i.dropId === y)];
      expect(qx, `${who}: the read drop is still offered`).toBeDefined();
      expect(normalised(qx, [x]), who).toEqual(normalised(qy, [y]));
    }
  });

  it("GET /api/readings/:id of the other reading answers exactly as for a reading that does not exist", async () => {
    for (const [who, c] of observers) {
      const [other, none] = [await c.get(`/api/readings/${firstReadingId}`), await c.get("/api/readings/00000000-0000-4000-8000-000000000000")];
      expect(other.status, who).toBe(404);
      expect((await other.json()).error.message).toBe((await none.json()).error.message);
    }
  });

  it("the run, the submission and the leads' queue carry nothing of it", async () => {
    for (const [who, c] of observers) {
      for (const path of [`/api/runs/${runId}`, `/api/submissions/${submissionId}`]) expectNothingOfTheFirstReading(await json(await c.get(path), 200));
      if (!who.startsWith("lead")) continue;
      // Other tests' settled drops are in the leads' queue and the agreement; this one is not, nor any trace of its reading.
      for (const path of ["/api/discrepancies", "/api/agreement"]) {
        const text = JSON.stringify(await json(await c.get(path), 200));
        for (const secret of [x, firstReadingId, firstUser.id]) expect(text, path).not.toContain(secret);
      }
    }
  });

  it("starting, marking and discarding a reading answer the same on both drops", async () => {
    for (const [who, c] of observers) {
      const [sx, sy] = [await mark(c, x, { dispenseFrame: 4 }), await mark(c, y, { dispenseFrame: 4 })];
      expect(normalised(sx, [x, sx.myDraft!.id]), who).toEqual(normalised(sy, [y, sy.myDraft!.id]));
      expect(sx.myDraft!.slot).toBeNull();
      expectNothingOfTheFirstReading(sx);
      const [px, py] = [
        await json(await c.patch(`/api/readings/${sx.myDraft!.id}`, { clearFrame: 30 }), 200),
        await json(await c.patch(`/api/readings/${sy.myDraft!.id}`, { clearFrame: 30 }), 200),
      ];
      expect(normalised(px, [x, sx.myDraft!.id]), who).toEqual(normalised(py, [y, sy.myDraft!.id]));
      const [gx, gy] = [await json(await c.get(`/api/readings/${sx.myDraft!.id}`), 200), await json(await c.get(`/api/readings/${sy.myDraft!.id}`), 200)];
      expect(normalised(gx, [x, sx.myDraft!.id]), who).toEqual(normalised(gy, [y, sy.myDraft!.id]));
      const [ex, ey] = [
        await json(await c.request("DELETE", `/api/readings/${sx.myDraft!.id}`), 200),
        await json(await c.request("DELETE", `/api/readings/${sy.myDraft!.id}`), 200),
      ];
      expect(normalised(ex, [x]), who).toEqual(normalised(ey, [y]));
    }
  });

  it("once both are submitted, the second reader sees both readings and how they compare", async () => {
    const [, second] = observers[0];
    const after = await read(second, x, 3, 31);
    expect(after).toMatchObject({ blind: false, state: "agreed" });
    expect(after.readings.map((r) => r.reviewerName)).toContain(firstUser.name);
    expect((await json(await second.get(`/api/readings/${firstReadingId}`), 200)).reading).toMatchObject({ clearFrame: 31, slot: 1 });
    // A submitted reading on an unread drop stays blind to its own reader: state and slot hidden.
    const alone = await read(second, y, 3, 31);
    expect(alone).toMatchObject({ blind: true, state: null });
    expect(alone.mySubmitted!.slot).toBeNull();
  });

  it("a technician, who does not read drops, sees the state (and is never a reader)", async () => {
    const d = (await json(await tech.get(`/api/drops/${y}`), 200)).drop;
    expect(d).toMatchObject({ blind: false, state: "read once" });
    expect((await tech.post(`/api/drops/${y}/readings`, { dispenseFrame: 1 })).status).toBe(403);
  });
});
