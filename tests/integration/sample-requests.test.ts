import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb } from "@/lib/db";
import type { SampleRequest } from "@/lib/sample-requests/view";
import { signedIn, type Client } from "../helpers/app";
import { demo, makeUser, uniqueEmail } from "../helpers/fixtures";
import { newSubmission, today, uniqueName } from "../helpers/intake";
import { waitForMail } from "../helpers/mailbox";
import { json } from "../helpers/readings";

// Requests for more samples over HTTP: the lab asks, the submission waits for the round, the
// manufacturer's contacts are mailed, the manufacturer acknowledges with shipping details and the
// lab sees them. Another organisation's manufacturer finds nothing there.
let lead: Client;
let tech: Client;
let maker: Client;
let stranger: Client;
let makerEmail: string;
let contactEmail: string;
let submissionId: string;
let reference: string;

const inDays = (n: number) => new Date(Date.now() + n * 86_400_000).toISOString().slice(0, 10);
const errorOf = async (res: Response, status: number) => (await json<{ error: { message: string; fields?: Record<string, string> } }>(res, status)).error;

beforeAll(async () => {
  lead = await signedIn(demo.email("lead"), demo.password);
  tech = await signedIn(demo.email("technician"), demo.password);
  contactEmail = uniqueEmail("contact");
  const org = (
    await json<{ organisation: { id: string } }>(
      await lead.post("/api/organisations", { name: uniqueName("Requests maker (invented)"), contactEmails: [contactEmail] }),
      201,
    )
  ).organisation;
  const other = (await json<{ organisation: { id: string } }>(await lead.post("/api/organisations", { name: uniqueName("Other maker (invented)") }), 201))
    .organisation;
  const m = await makeUser(["manufacturer"], { organisationId: org.id });
  const s = await makeUser(["manufacturer"], { organisationId: other.id });
  makerEmail = m.email;
  [maker, stranger] = [await signedIn(m.email, m.password), await signedIn(s.email, s.password)];
  ({ id: submissionId, reference } = await newSubmission(tech, org.id, { receivedOn: today() }));
}, 60_000);
afterAll(() => closeDb());

describe("requests for more samples", () => {
  let request: SampleRequest;

  it("a technician asks for round 2: the submission waits for it and the manufacturer's contacts are mailed", async () => {
    const dueBy = inDays(10);
    request = (
      await json<{ request: SampleRequest }>(
        await tech.post(`/api/submissions/${submissionId}/sample-requests`, { count: 8, weight: "15 lb", dueBy, note: "Same cover as round 1." }),
        201,
      )
    ).request;
    expect(request).toMatchObject({ round: 2, count: 8, weight: "15 lb", dueBy, note: "Same cover as round 1.", acknowledgedAt: null, shippingDetails: null });
    const detail = await json<{ submission: { currentRound: number; status: string } }>(await tech.get(`/api/submissions/${submissionId}`), 200);
    expect(detail.submission).toMatchObject({ currentRound: 2, status: "awaiting_samples" });

    for (const to of [makerEmail, contactEmail]) {
      const [mail] = await waitForMail(to, 1, 30_000);
      expect(mail.subject).toBe(`${reference}: please send 8 more samples for round 2`);
      expect(mail.text).toContain("8 more sample balls");
      expect(mail.text).toContain("Weight: 15 lb.");
      expect(mail.text).toContain(`by ${dueBy}`);
      expect(mail.text).toContain(`/portal/submissions/${submissionId}`);
    }
  }, 60_000);

  it("refuses, in words, a second request while the round waits, a past due date and a bad count; nothing changes", async () => {
    const again = await errorOf(await tech.post(`/api/submissions/${submissionId}/sample-requests`, { count: 3, weight: "15 lb", dueBy: inDays(5) }), 409);
    expect(again.message).toBe("Round 2 is already waiting for its samples.");
    const past = await errorOf(await lead.post(`/api/submissions/${submissionId}/sample-requests`, { count: 3, weight: "15 lb", dueBy: "2020-01-01" }), 422);
    expect(past.fields).toMatchObject({ dueBy: "Choose today or a later date." });
    const bad = await errorOf(await lead.post(`/api/submissions/${submissionId}/sample-requests`, { count: 0, weight: "", dueBy: inDays(5) }), 422);
    expect(Object.keys(bad.fields ?? {})).toEqual(expect.arrayContaining(["count", "weight"]));
    const list = await json<{ requests: SampleRequest[] }>(await tech.get(`/api/submissions/${submissionId}/sample-requests`), 200);
    expect(list.requests.map((r) => r.round)).toEqual([2]);
  });

  it("only the manufacturer acknowledges; the staff and another organisation are refused", async () => {
    const byLab = await errorOf(await lead.post(`/api/sample-requests/${request.id}/acknowledge`, { shippingDetails: "x" }), 403);
    expect(byLab.message).toMatch(/manufacturer/);
    expect((await stranger.post(`/api/sample-requests/${request.id}/acknowledge`, { shippingDetails: "Parcel post" })).status).toBe(404);
    expect((await stranger.get(`/api/submissions/${submissionId}/sample-requests`)).status).toBe(404);
    expect(await errorOf(await maker.post("/api/sample-requests/not-a-request/acknowledge", { shippingDetails: "x" }), 404)).toMatchObject({
      message: "No such request.",
    });
    const empty = await errorOf(await maker.post(`/api/sample-requests/${request.id}/acknowledge`, { shippingDetails: "  ", shippedOn: "not a day" }), 422);
    expect(Object.keys(empty.fields ?? {})).toEqual(expect.arrayContaining(["shippingDetails", "shippedOn"]));
  });

  it("the manufacturer sees the request, acknowledges it with shipping details, and the lab sees them", async () => {
    const mine = await json<{ requests: SampleRequest[] }>(await maker.get(`/api/submissions/${submissionId}/sample-requests`), 200);
    expect(mine.requests).toEqual([expect.objectContaining({ id: request.id, count: 8, weight: "15 lb", round: 2 })]);
    const shippingDetails = "Carrier: Example Freight, tracking EF-000123 (invented), 2 boxes";
    const shippedOn = today();
    const done = (
      await json<{ request: SampleRequest }>(await maker.post(`/api/sample-requests/${request.id}/acknowledge`, { shippingDetails, shippedOn }), 200)
    ).request;
    expect(done).toMatchObject({ shippingDetails, shippedOn, acknowledgedByName: expect.any(String) });
    expect(done.acknowledgedAt).not.toBeNull();
    const seen = await json<{ requests: SampleRequest[] }>(await tech.get(`/api/submissions/${submissionId}/sample-requests`), 200);
    expect(seen.requests[0]).toMatchObject({ shippingDetails, shippedOn, acknowledgedAt: done.acknowledgedAt });
    const twice = await errorOf(await maker.post(`/api/sample-requests/${request.id}/acknowledge`, { shippingDetails: "again" }), 409);
    expect(twice.message).toBe("This request is already acknowledged.");
  });

  it("a malformed submission id is 'no such submission', not a database error", async () => {
    expect(await errorOf(await tech.get("/api/submissions/not-an-id/sample-requests"), 404)).toMatchObject({ message: "No such submission." });
  });
});
