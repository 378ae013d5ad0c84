import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { findAuditEvents } from "@/lib/audit/queries";
import { closeDb, db } from "@/lib/db";
import { listOrganisations } from "@/lib/organisations/queries";
import { signedIn, type Client } from "../helpers/app";
import { demo } from "../helpers/fixtures";
import { goodRun, newRun, newSample, newSubmission } from "../helpers/intake";

let tech: Client;
let lead: Client;
let reviewer: Client;
let org: string;

beforeAll(async () => {
  [tech, lead, reviewer] = await Promise.all([
    signedIn(demo.email("technician"), demo.password),
    signedIn(demo.email("lead"), demo.password),
    signedIn(demo.email("reviewer"), demo.password),
  ]);
  org = (await listOrganisations(db())).find((o) => o.name.startsWith("Tallowby"))!.id;
});
afterAll(() => closeDb());

const samplesOf = async (c: Client, id: string) =>
  ((await (await c.get(`/api/submissions/${id}`)).json()).rounds as { round: number; samples: { serial: string; weightG: number }[] }[]).flatMap(
    (r) => r.samples,
  );

describe("samples", () => {
  it("stores a weight entered in ounces as grams and refuses a duplicate serial", async () => {
    const s = await newSubmission(tech, org);
    const sample = await newSample(tech, s.id, { serial: "OZ-1", weight: { value: "256", unit: "oz" } });
    expect(sample).toMatchObject({ serial: "OZ-1", weightG: 7257.48, round: 1 });
    const dup = await tech.post(`/api/submissions/${s.id}/samples`, {
      serial: "oz-1",
      weight: { value: 7000, unit: "g" },
      receivedAt: new Date().toISOString(),
    });
    expect(dup.status).toBe(409);
    expect((await dup.json()).error.fields.serial).toBe("This serial is already recorded.");
  });

  it("imports a good CSV in one go", async () => {
    const s = await newSubmission(tech, org);
    const res = await tech.post(`/api/submissions/${s.id}/samples/import`, {
      csv: "serial,weight\nC-1,16\nC-2,15.5\n",
      unit: "lb",
      receivedAt: new Date().toISOString(),
    });
    expect(res.status).toBe(201);
    expect(await res.json()).toEqual({ created: 2 });
    expect((await samplesOf(tech, s.id)).map((x) => [x.serial, x.weightG])).toEqual([
      ["C-1", 7257.48],
      ["C-2", 7030.68],
    ]);
    const [event] = await findAuditEvents(db(), { entity: "submission", entityId: s.id, action: "sample.imported" });
    expect((event.after as { samples: unknown[] }).samples).toHaveLength(2);
  });

  it("reports each bad row with its line and saves none of the file", async () => {
    const s = await newSubmission(tech, org);
    await newSample(tech, s.id, { serial: "TAKEN" });
    const csv = "serial,weight\nOK-1,7000\n,7000\nOK-2,lots\nTAKEN,7000\n";
    const first = await tech.post(`/api/submissions/${s.id}/samples/import`, { csv, unit: "g", receivedAt: new Date().toISOString() });
    expect(first.status).toBe(422);
    const body = (await first.json()).error;
    expect(body.message).toBe("2 rows of the CSV need correcting; nothing was saved.");
    expect(body.fields).toEqual({ "line 3": "The serial number is missing.", "line 4": 'The weight "lots" is not a number.' });

    const clash = await tech.post(`/api/submissions/${s.id}/samples/import`, {
      csv: "serial,weight\nOK-1,7000\nTAKEN,7000\n",
      unit: "g",
      receivedAt: new Date().toISOString(),
    });
    expect((await clash.json()).error.fields).toEqual({ "line 3": "Serial TAKEN is already recorded for this submission." });
    expect((await samplesOf(tech, s.id)).map((x) => x.serial)).toEqual(["TAKEN"]);
  });

  it("deletes a mistaken sample, but never one with a run", async () => {
    const s = await newSubmission(tech, org);
    const a = await newSample(tech, s.id);
    const b = await newSample(tech, s.id);
    await newRun(tech, b.id);
    expect((await tech.request("DELETE", `/api/samples/${a.id}`)).status).toBe(200);
    const refused = await tech.request("DELETE", `/api/samples/${b.id}`);
    expect(refused.status).toBe(409);
    expect((await refused.json()).error.message).toMatch(/has 1 run\(s\) recorded and cannot be deleted/);
    const [event] = await findAuditEvents(db(), { entity: "sample", entityId: a.id, action: "sample.deleted" });
    expect(event.before).toMatchObject({ serial: a.serial });
  });
});

describe("runs and their conditions", () => {
  it("records a run with one drop per the edition's drops per ball and starts testing", async () => {
    const s = await newSubmission(tech, org);
    const sample = await newSample(tech, s.id);
    const run = await newRun(tech, sample.id);
    expect(run).toMatchObject({ dropCount: 3, flags: [], needsAcceptance: false });
    const detail = await (await tech.get(`/api/submissions/${s.id}`)).json();
    expect(detail.submission.status).toBe("testing");
  });

  it("flags conditions outside the edition, and a lead accepts them with a reason", async () => {
    const s = await newSubmission(tech, org);
    const sample = await newSample(tech, s.id, { acclimationStartedAt: new Date(Date.now() - 10 * 3_600_000).toISOString() });
    const run = await newRun(tech, sample.id, { surfaceTemp: { value: "80", unit: "F" } });
    expect(run.flags.map((f) => f.code)).toEqual(["acclimation_short", "surface_temp"]);
    expect(run.flags[1].message).toBe("Surface temperature 26.7 °C is outside the edition's window of 20–24 °C.");
    expect((await (await tech.get(`/api/submissions/${s.id}`)).json()).flaggedRuns).toBe(1);
    const listedFlags = async () => (await (await tech.get(`/api/submissions?q=${s.reference}`)).json()).rows[0].flaggedRuns;
    expect(await listedFlags()).toBe(1);

    expect((await tech.post(`/api/runs/${run.id}/acceptance`, { reason: "Checked by the lead." })).status).toBe(403);
    expect((await reviewer.post(`/api/runs/${run.id}/acceptance`, { reason: "Checked by the lead." })).status).toBe(403);
    const short = await lead.post(`/api/runs/${run.id}/acceptance`, { reason: "ok" });
    expect((await short.json()).error.fields.reason).toMatch(/at least 10 characters/);

    const accepted = await lead.post(`/api/runs/${run.id}/acceptance`, { reason: "Room logger shows the ball was in the room for 30 h." });
    expect(accepted.status).toBe(200);
    expect((await accepted.json()).run).toMatchObject({
      needsAcceptance: false,
      acceptedByName: "Demo Lead",
      acceptReason: "Room logger shows the ball was in the room for 30 h.",
    });
    expect((await lead.post(`/api/runs/${run.id}/acceptance`, { reason: "Accept it a second time." })).status).toBe(409);
    expect(await listedFlags()).toBe(0);
    const [event] = await findAuditEvents(db(), { entity: "run", entityId: run.id, action: "run.accepted" });
    expect(event.after).toMatchObject({ reason: "Room logger shows the ball was in the room for 30 h." });

    // New conditions are a new question: the acceptance no longer applies.
    const edited = await tech.request("PUT", `/api/runs/${run.id}`, { json: goodRun({ surfaceTemp: { value: 81, unit: "F" } }) });
    expect((await edited.json()).run).toMatchObject({ needsAcceptance: true, acceptedAt: null });
  });

  it("refuses to accept a run with nothing flagged", async () => {
    const s = await newSubmission(tech, org);
    const run = await newRun(tech, (await newSample(tech, s.id)).id);
    const res = await lead.post(`/api/runs/${run.id}/acceptance`, { reason: "Nothing to accept here." });
    expect(res.status).toBe(409);
  });

  it("explains bad run input in words", async () => {
    const s = await newSubmission(tech, org);
    const sample = await newSample(tech, s.id);
    const res = await tech.post(
      `/api/samples/${sample.id}/runs`,
      goodRun({ testedAt: "yesterday", roomTemp: { value: "warm", unit: "C" }, roughnessRaUm: [-1], oilLot: "" }),
    );
    expect(res.status).toBe(422);
    expect((await res.json()).error.fields).toEqual({
      testedAt: "Tested at must be a date and time with its zone (ISO 8601).",
      "roomTemp.value": "Room temperature must be a number.",
      "roughnessRaUm.0": "A roughness reading (Ra) must be between 0 and 100 µm.",
      oilLot: "Oil lot is required.",
    });
  });
});
