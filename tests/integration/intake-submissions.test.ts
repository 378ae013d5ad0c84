import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { findAuditEvents } from "@/lib/audit/queries";
import { closeDb, db } from "@/lib/db";
import { listOrganisations } from "@/lib/organisations/queries";
import { DEMO_EDITION } from "@/seeds/demo-intake";
import { signedIn, type Client } from "../helpers/app";
import { demo } from "../helpers/fixtures";
import { editionBody, newEdition, newSubmission, today, uniqueName } from "../helpers/intake";

let tech: Client;
let lead: Client;
let orgA: string;
let orgB: string;

beforeAll(async () => {
  tech = await signedIn(demo.email("technician"), demo.password);
  lead = await signedIn(demo.email("lead"), demo.password);
  const orgs = await listOrganisations(db());
  orgA = orgs.find((o) => o.name.startsWith("Tallowby"))!.id;
  orgB = orgs.find((o) => o.name.startsWith("Brindlecombe"))!.id;
});
afterAll(() => closeDb());

describe("submissions", () => {
  it("pins the edition in force on the received date and gives a reference", async () => {
    const s = await newSubmission(tech, orgA, { receivedOn: "2026-06-01" });
    const detail = await (await tech.get(`/api/submissions/${s.id}`)).json();
    expect(detail.view).toBe("staff");
    expect(detail.submission).toMatchObject({ status: "received", currentRound: 1, editionName: DEMO_EDITION.name, weightClassesLb: [15, 16] });
    expect(detail.submission.reference).toMatch(/^S-2026-\d{4}$/);
    const [event] = await findAuditEvents(db(), { entity: "submission", entityId: s.id });
    expect(event.action).toBe("submission.created");
  });

  it("pins an older edition for an older received date, and refuses a date no edition covers", async () => {
    const old = await newEdition(lead, { effectiveFrom: "2019-01-01", name: uniqueName("Old edition") });
    const s = await newSubmission(tech, orgA, { receivedOn: "2019-02-01" });
    const detail = await (await tech.get(`/api/submissions/${s.id}`)).json();
    expect(detail.edition.id).toBe(old.id);
    const none = await tech.post("/api/submissions", { organisationId: orgA, modelName: "Too old", kind: "approval", receivedOn: "2000-01-01" });
    expect(none.status).toBe(422);
    expect((await none.json()).error.fields.receivedOn).toBe("No edition is in force on this date.");
  });

  it("links a surveillance submission to an approval of the same organisation only", async () => {
    const approval = await newSubmission(tech, orgA);
    const ok = await tech.post("/api/submissions", {
      organisationId: orgA,
      modelName: "Watched",
      kind: "surveillance",
      receivedOn: today(),
      approvalSubmissionId: approval.id,
    });
    expect(ok.status).toBe(201);
    expect((await ok.json()).submission.approvalReference).toBe(approval.reference);

    const missing = await tech.post("/api/submissions", { organisationId: orgA, modelName: "Watched", kind: "surveillance", receivedOn: today() });
    expect((await missing.json()).error.fields.approvalSubmissionId).toMatch(/must name the approval submission/);
    const crossed = await tech.post("/api/submissions", {
      organisationId: orgB,
      modelName: "Watched",
      kind: "surveillance",
      receivedOn: today(),
      approvalSubmissionId: approval.id,
    });
    expect((await crossed.json()).error.message).toMatch(/belongs to another organisation/);
  });

  it("explains bad input in words and saves nothing", async () => {
    const model = uniqueName("Never saved");
    const res = await tech.post("/api/submissions", { organisationId: "nope", modelName: model, kind: "sphere", weightClassesLb: [17], receivedOn: "1 Dec" });
    expect(res.status).toBe(422);
    expect((await res.json()).error.fields).toEqual({
      organisationId: "Choose an organisation from the list.",
      kind: "Choose approval, surveillance or research.",
      "weightClassesLb.0": "Weight classes run from 6 to 16 lb.",
      receivedOn: "Received date must be a date (YYYY-MM-DD).",
    });
    const future = await tech.post("/api/submissions", { organisationId: orgA, modelName: model, kind: "approval", receivedOn: "2099-01-01" });
    expect((await future.json()).error.fields.receivedOn).toBe("The received date cannot be in the future.");
    const list = await (await tech.get(`/api/submissions?q=${encodeURIComponent(model)}`)).json();
    expect(list.total).toBe(0);
  });

  it("filters, sorts and pages on the server", async () => {
    const model = uniqueName("Paged");
    for (let i = 0; i < 3; i++) await newSubmission(tech, orgB, { modelName: `${model} ${i}`, receivedOn: `2026-07-0${i + 1}` });
    const page1 = await (await tech.get(`/api/submissions?q=${encodeURIComponent(model)}&sort=received&dir=asc&pageSize=5&page=1`)).json();
    expect(page1.total).toBe(3);
    expect(page1.rows.map((r: { receivedOn: string }) => r.receivedOn)).toEqual(["2026-07-01", "2026-07-02", "2026-07-03"]);
    const small = await (
      await tech.get(`/api/submissions?q=${encodeURIComponent(model)}&sort=model&dir=desc&pageSize=5&page=1&receivedFrom=2026-07-02`)
    ).json();
    expect(small.rows.map((r: { modelName: string }) => r.modelName)).toEqual([`${model} 2`, `${model} 1`]);
    const none = await (await tech.get(`/api/submissions?q=${encodeURIComponent(model)}&organisationId=${orgA}`)).json();
    expect(none.total).toBe(0);
    const bad = await tech.get("/api/submissions?sort=colour&pageSize=1000");
    expect(bad.status).toBe(422);
  });
});

describe("specification editions", () => {
  it("refuses to change an edition a submission uses, in the API and in the database itself", async () => {
    const demoEdition = await db()("specification_editions").where({ name: DEMO_EDITION.name }).first("id");
    const res = await lead.request("PUT", `/api/editions/${demoEdition.id}`, {
      json: editionBody({ name: DEMO_EDITION.name, effectiveFrom: "2026-01-01", minAbsorptionS: 100 }),
    });
    expect(res.status).toBe(409);
    expect((await res.json()).error.message).toMatch(/cannot be changed. Create a new edition from it instead/);
    await expect(db()("specification_editions").where({ id: demoEdition.id }).update({ min_absorption_s: 100 })).rejects.toThrow(
      /used by a submission and cannot be changed/,
    );
    const still = await (await lead.get(`/api/editions/${demoEdition.id}`)).json();
    expect(still.edition.minAbsorptionS).toBe(135);
    expect(still.edition.usedBy.length).toBeGreaterThan(0);
  });

  it("lets a lead change an unused edition, and make a new one from an old one", async () => {
    const e = await newEdition(lead);
    const changed = await lead.request("PUT", `/api/editions/${e.id}`, { json: editionBody({ name: e.name, guardBandS: 12 }) });
    expect(changed.status).toBe(200);
    expect((await changed.json()).edition.guardBandS).toBe(12);
    const child = await newEdition(lead, { basedOnId: e.id, minAbsorptionS: 140 });
    const detail = await (await lead.get(`/api/editions/${child.id}`)).json();
    expect(detail.edition).toMatchObject({ basedOnId: e.id, minAbsorptionS: 140 });
    const audit = await findAuditEvents(db(), { entity: "specification_edition", entityId: e.id });
    expect(audit.map((a) => a.action)).toEqual(["edition.updated", "edition.created"]);
  });

  it("explains an impossible edition in words", async () => {
    const res = await lead.post("/api/editions", editionBody({ toleranceCoverage: 1.5, surfaceTempMinC: 25, roundSizes: [], dropsPerBall: "three" }));
    expect(res.status).toBe(422);
    const fields = (await res.json()).error.fields;
    expect(fields).toMatchObject({
      toleranceCoverage: "Tolerance coverage must be between 0 and 1, e.g. 0.95.",
      roundSizes: "Give at least one round size.",
      dropsPerBall: "Drops per ball must be a number.",
    });
  });
});
