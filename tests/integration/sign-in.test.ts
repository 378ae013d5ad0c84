import { afterAll, describe, expect, it } from "vitest";
import { closeDb } from "@/lib/db";
import { THROTTLE } from "@/lib/auth/throttle";
import { Client, signedIn } from "../helpers/app";
import { demo, makeUser, uniqueEmail } from "../helpers/fixtures";

afterAll(() => closeDb());

const WRONG = "The e-mail or password is not right. Check both and try again.";

describe("sign-in", () => {
  it("signs a demo lead in and the session knows who it is", async () => {
    const c = await signedIn(demo.email("lead"), demo.password);
    const me = await (await c.get("/api/me")).json();
    expect(me).toMatchObject({ email: demo.email("lead"), roles: ["lead", "reviewer"] });
  });

  it("refuses a wrong password and an unknown e-mail with the same words", async () => {
    const user = await makeUser(["technician"]);
    expect(await new Client().signIn(user.email, "not the password")).toBe(WRONG);
    expect(await new Client().signIn(uniqueEmail("nobody"), "whatever-password")).toBe(WRONG);
  });

  it("throttles an account after five failures, even from another address and with the right password", async () => {
    const user = await makeUser(["reviewer"]);
    for (let i = 0; i < THROTTLE.maxFailuresPerAccount; i++) {
      expect(await new Client().signIn(user.email, `wrong-${i}`)).toBe(WRONG);
    }
    const blocked = await new Client().signIn(user.email, user.password);
    expect(blocked).toMatch(/^Too many failed sign-ins\. Wait 1[45] minutes and try again\.$/);
  });

  it("throttles an address after many failures across accounts", async () => {
    const c = new Client();
    for (let i = 0; i < THROTTLE.maxFailuresPerAddress; i++) {
      expect(await c.signIn(uniqueEmail(`spray${i}`), "guess-password")).toBe(WRONG);
    }
    const user = await makeUser(["technician"]);
    expect(await c.signIn(user.email, user.password)).toMatch(/Too many failed sign-ins/);
    expect(await new Client().signIn(user.email, user.password)).toBeNull();
  });

  it("a success clears the account's earlier failures", async () => {
    const user = await makeUser(["technician"]);
    for (let i = 0; i < THROTTLE.maxFailuresPerAccount - 1; i++) await new Client().signIn(user.email, "wrong-password");
    expect(await new Client().signIn(user.email, user.password)).toBeNull();
    for (let i = 0; i < THROTTLE.maxFailuresPerAccount - 1; i++) await new Client().signIn(user.email, "wrong-password");
    expect(await new Client().signIn(user.email, user.password)).toBeNull();
  });

  it("refuses a deactivated account at once, on the next request of a live session", async () => {
    const user = await makeUser(["technician"]);
    const session = await signedIn(user.email, user.password);
    expect((await session.get("/api/me")).status).toBe(200);

    const lead = await signedIn(demo.email("lead"), demo.password);
    expect((await lead.patch(`/api/users/${user.id}`, { active: false })).status).toBe(200);

    const after = await session.get("/api/me");
    expect(after.status).toBe(401);
    expect((await after.json()).error.message).toBe("Please sign in first.");
    expect(await new Client().signIn(user.email, user.password)).toMatch(/deactivated/);
    // Pages too: the staff layout sends the stale session to sign-in.
    const page = await session.get("/overview");
    expect(page.status).toBe(307);
    expect(page.headers.get("location")).toContain("/sign-in");
  });

  it("applies a role change at once, without signing in again", async () => {
    const user = await makeUser(["technician"]);
    const session = await signedIn(user.email, user.password);
    expect((await session.get("/api/users")).status).toBe(403);

    const lead = await signedIn(demo.email("lead"), demo.password);
    expect((await lead.patch(`/api/users/${user.id}`, { roles: ["technician", "lead"] })).status).toBe(200);
    expect((await session.get("/api/users")).status).toBe(200);

    expect((await lead.patch(`/api/users/${user.id}`, { roles: ["technician"] })).status).toBe(200);
    expect((await session.get("/api/users")).status).toBe(403);
  });
});
