import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb, db } from "@/lib/db";
import { listOrganisations } from "@/lib/organisations/queries";
import { signedIn, type Client } from "../helpers/app";
import { demo, makeUser } from "../helpers/fixtures";
import { goodRun, newRun, newSample, newSubmission } from "../helpers/intake";

// A manufacturer sees only its own organisation's records; anything else answers 404, exactly
// as if it did not exist.
let tech: Client;
let makerA: Client;
let own: { submission: string; sample: string; run: string };
let other: { submission: string; sample: string; run: string };

beforeAll(async () => {
  tech = await signedIn(demo.email("technician"), demo.password);
  const orgs = await listOrganisations(db());
  const orgA = orgs.find((o) => o.name.startsWith("Tallowby"))!.id;
  const orgB = orgs.find((o) => o.name.startsWith("Brindlecombe"))!.id;
  const u = await makeUser(["manufacturer"], { organisationId: orgA });
  makerA = await signedIn(u.email, u.password);
  const make = async (org: string) => {
    const submission = (await newSubmission(tech, org)).id;
    const sample = (await newSample(tech, submission)).id;
    const run = (await newRun(tech, sample)).id;
    return { submission, sample, run };
  };
  own = await make(orgA);
  other = await make(orgB);
  otherBefore = await otherRecords();
});
// Every row of the other organisation's submission, its samples and their runs, as stored.
let otherBefore: Awaited<ReturnType<typeof otherRecords>>;
async function otherRecords() {
  return {
    submission: await db()("submissions").where({ id: other.submission }).first(),
    samples: await db()("samples").where({ submission_id: other.submission }).orderBy("id"),
    runs: await db()("runs")
      .whereIn("sample_id", db()("samples").select("id").where({ submission_id: other.submission }))
      .orderBy("id"),
  };
}
afterAll(() => closeDb());

describe("a manufacturer and another organisation's records", () => {
  it("lists only its own organisation's submissions, whatever filter it sends", async () => {
    const all = await (await makerA.get("/api/submissions?pageSize=100")).json();
    const ids = all.rows.map((r: { id: string }) => r.id);
    expect(ids).toContain(own.submission);
    expect(ids).not.toContain(other.submission);
    expect(new Set(all.rows.map((r: { organisationName: string }) => r.organisationName))).toEqual(new Set(["Tallowby Ball Works (invented)"]));
    const otherOrg = (await db()("submissions").where({ id: other.submission }).first("organisation_id")).organisation_id;
    const filtered = await (await makerA.get(`/api/submissions?organisationId=${otherOrg}`)).json();
    expect(filtered.total).toBe(0);
  });

  it("reads its own submission as a summary without lab-internal detail", async () => {
    const res = await makerA.get(`/api/submissions/${own.submission}`);
    expect(res.status).toBe(200);
    const body = await res.json();
    expect(body.view).toBe("manufacturer");
    expect(body.samplesByRound).toEqual([{ round: 1, count: 1 }]);
    expect(JSON.stringify(body)).not.toMatch(/technician|oilLot|surfaceTemp/i);
  });

  const attempts: [string, string, () => string, unknown?][] = [
    ["read the submission", "GET", () => `/api/submissions/${other.submission}`],
    ["change the submission", "PATCH", () => `/api/submissions/${other.submission}`, { notes: "mine now" }],
    [
      "add a sample",
      "POST",
      () => `/api/submissions/${other.submission}/samples`,
      { serial: "X", weight: { value: 7000, unit: "g" }, receivedAt: new Date().toISOString() },
    ],
    ["import samples", "POST", () => `/api/submissions/${other.submission}/samples/import`, { csv: "X,7000", unit: "g", receivedAt: new Date().toISOString() }],
    ["change a sample", "PATCH", () => `/api/samples/${other.sample}`, { notes: "mine" }],
    ["delete a sample", "DELETE", () => `/api/samples/${other.sample}`],
    ["record a run", "POST", () => `/api/samples/${other.sample}/runs`, goodRun()],
    ["read a run", "GET", () => `/api/runs/${other.run}`],
    ["change a run", "PUT", () => `/api/runs/${other.run}`, goodRun()],
    ["accept a run", "POST", () => `/api/runs/${other.run}/acceptance`, { reason: "Let me accept it." }],
  ];
  for (const [what, method, path, body] of attempts) {
    it(`gets 404 trying to ${what}`, async () => {
      const res = await makerA.request(method, path(), body === undefined ? {} : { json: body });
      expect(res.status).toBe(404);
      expect((await res.json()).error.message).toMatch(/^No such (submission|sample|run)\.$/);
    });
  }

  it("cannot change even its own records (403), and nothing changed", async () => {
    expect((await makerA.patch(`/api/submissions/${own.submission}`, { notes: "changed by maker" })).status).toBe(403);
    const row = await db()("submissions").where({ id: own.submission }).first("notes");
    expect(row.notes).toBe("");
    expect(await db()("samples").where({ id: other.sample }).first("id")).toEqual({ id: other.sample });
  });

  it("left every record of the other organisation as it was after the refused writes", async () => {
    expect(otherBefore.samples.map((x: { id: string }) => x.id)).toEqual([other.sample]);
    expect(otherBefore.runs.map((x: { id: string }) => x.id)).toEqual([other.run]);
    expect(await otherRecords()).toEqual(otherBefore);
    const me = (await (await makerA.get("/api/me")).json()).id;
    expect(await db()("audit_events").where({ actor_id: me }).whereNot("action", "like", "sign_in.%").select("action")).toEqual([]);
  });
});
