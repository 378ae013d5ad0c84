import { afterAll, describe, expect, it } from "vitest";
import { findAuditEvents } from "@/lib/audit/queries";
import { closeDb, db } from "@/lib/db";
import { Client, signedIn } from "../helpers/app";
import { demo, makeUser } from "../helpers/fixtures";

afterAll(() => closeDb());

describe("audit log", () => {
  it("records successful and failed sign-ins", async () => {
    const user = await makeUser(["reviewer"]);
    await new Client().signIn(user.email, "wrong-password");
    await signedIn(user.email, user.password);
    const events = await findAuditEvents(db(), { entity: "user", entityId: user.id });
    expect(events.map((e) => e.action)).toEqual(["sign_in.succeeded", "sign_in.failed"]);
    expect(events[1].after).toMatchObject({ email: user.email, reason: "wrong password" });
  });

  it("records a user change with who, before, after and the request id", async () => {
    const user = await makeUser(["technician"]);
    const lead = await signedIn(demo.email("lead"), demo.password);
    const res = await lead.patch(`/api/users/${user.id}`, { roles: ["technician", "reviewer"] });
    expect(res.status).toBe(200);
    const [event] = await findAuditEvents(db(), { entity: "user", entityId: user.id, action: "user.updated" });
    const me = await (await lead.get("/api/me")).json();
    expect(event.actorId).toBe(me.id);
    expect(event.before).toMatchObject({ roles: ["technician"] });
    expect(event.after).toMatchObject({ roles: ["technician", "reviewer"] });
    expect(event.requestId).toBe(res.headers.get("x-request-id"));
  });

  it("cannot be changed or removed, even by the database owner", async () => {
    const [event] = await findAuditEvents(db(), { limit: 1 });
    const stored = async () => db()("audit_events").where({ id: event.id }).first();
    const before = await stored();
    expect(before).toMatchObject({ id: event.id, action: event.action });
    await expect(db()("audit_events").where({ id: event.id }).update({ action: "tampered" })).rejects.toThrow(/append-only: UPDATE is refused/);
    await expect(db()("audit_events").where({ id: event.id }).delete()).rejects.toThrow(/append-only: DELETE is refused/);
    await expect(db().raw("truncate audit_events")).rejects.toThrow(/append-only: TRUNCATE is refused/);
    // The same row, by its id, every column as it was.
    expect(await stored()).toEqual(before);
    expect(await db()("audit_events").where({ action: "tampered" }).first("id")).toBeUndefined();
  });
});
