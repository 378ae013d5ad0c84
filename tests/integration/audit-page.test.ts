import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { AuditEventView } from "@/lib/audit/view";
import { closeDb } from "@/lib/db";
import { signedIn, type Client } from "../helpers/app";
import { demo, makeUser } from "../helpers/fixtures";
import { json, placedDrops, read } from "../helpers/readings";

// The leads' audit log over HTTP: filters, paging, and the blind rule for a lead who also reads.
let lead: Client;
let leadReader: Client;
let a: Client;
let aId: string;
let b: Client;
let dropIds: string[];
type Page = { events: AuditEventView[]; total: number; page: number; pageSize: number };
const audit = (c: Client, query: Record<string, string>) => c.get(`/api/audit?${new URLSearchParams(query)}`);

beforeAll(async () => {
  // The demo lead also reads drops; the lead here does not.
  leadReader = await signedIn(demo.email("lead"), demo.password);
  const [ua, ub, ul] = [await makeUser(["reviewer"]), await makeUser(["reviewer"]), await makeUser(["lead"])];
  aId = ua.id;
  [a, b, lead] = [await signedIn(ua.email, ua.password), await signedIn(ub.email, ub.password), await signedIn(ul.email, ul.password)];
  ({ dropIds } = await placedDrops(leadReader));
}, 120_000);
afterAll(() => closeDb());

describe("audit log for leads", () => {
  it("filters by who and action, and pages", async () => {
    await read(a, dropIds[0], 2, 12);
    await read(a, dropIds[1], 2, 14);
    const all = await json<Page>(await audit(lead, { actorId: aId, action: "reading.submitted" }), 200);
    expect(all.total).toBe(2);
    expect(all.events.every((e) => e.actor?.id === aId && e.action === "reading.submitted")).toBe(true);
    const page2 = await json<Page>(await audit(lead, { actorId: aId, action: "reading.submitted", pageSize: "1", page: "2" }), 200);
    expect(page2.events).toHaveLength(1);
    expect(page2.events[0].id).toBe(all.events[1].id);
    const today = new Date().toISOString().slice(0, 10);
    expect((await json<Page>(await audit(lead, { actorId: aId, from: today, to: today }), 200)).total).toBeGreaterThanOrEqual(2);
    expect((await json<Page>(await audit(lead, { actorId: aId, to: "2001-01-01" }), 200)).total).toBe(0);
    const bad = await audit(lead, { from: "yesterday" });
    expect(bad.status).toBe(422);
    expect(JSON.stringify(await bad.json())).toMatch(/must be a date/);
  });

  it("hides a reading's marks from a lead who also reads, until both readings are in", async () => {
    const query = { actorId: aId, action: "reading.submitted", entity: "reading" };
    const forReader = await json<Page>(await audit(leadReader, query), 200);
    const ev = forReader.events[0];
    expect(ev).toMatchObject({ hidden: "hidden until both readings are in", before: null, after: null });
    const forLead = (await json<Page>(await audit(lead, query), 200)).events.find((e) => e.id === ev.id)!;
    expect(forLead.after).toMatchObject({ dispenseFrame: 2 });
    const dropId = (forLead.after as { dropId: string }).dropId;
    await read(b, dropId, 2, 12);
    const now = (await json<Page>(await audit(leadReader, query), 200)).events.find((e) => e.id === ev.id)!;
    expect(now).toMatchObject({ hidden: null, after: { dispenseFrame: 2, dropId } });
  });
});
