import { afterAll, describe, expect, it } from "vitest";
import { closeDb, db } from "@/lib/db";
import { findUserByEmail } from "@/lib/users/queries";
import { hashToken } from "@/lib/users/tokens";
import { Client, signedIn } from "../helpers/app";
import { demo, demoOrganisationId, makeUser, uniqueEmail } from "../helpers/fixtures";
import { inviteLink, waitForMail } from "../helpers/mailbox";

afterAll(() => closeDb());

const tokenOf = (link: string) => link.split("/invite/")[1];

async function invite(lead: Client, body: Record<string, unknown>) {
  const res = await lead.post("/api/users", body);
  expect(res.status).toBe(201);
  const [mail] = await waitForMail(String(body.email));
  return { user: (await res.json()).user, link: inviteLink(mail), mail };
}

describe("invitations", () => {
  it("lead invites, the person follows the e-mailed link, sets a password and signs in", async () => {
    const lead = await signedIn(demo.email("lead"), demo.password);
    const email = uniqueEmail("newcomer");
    const { user, link, mail } = await invite(lead, { email, name: "New Reviewer", roles: ["reviewer"] });
    expect(user).toMatchObject({ email, status: "invited", roles: ["reviewer"] });
    expect(mail.subject).toBe("Your Wickmark invitation");

    const visitor = new Client();
    const page = await visitor.get(new URL(link).pathname);
    expect(page.status).toBe(200);
    expect(await page.text()).toContain("New Reviewer");
    expect(await (await visitor.get(`/api/invites/${tokenOf(link)}`)).json()).toEqual({ email, name: "New Reviewer" });

    expect((await visitor.post(`/api/invites/${tokenOf(link)}`, { password: "a fresh password" })).status).toBe(200);
    expect(await visitor.signIn(email, "a fresh password")).toBeNull();
    expect((await (await visitor.get("/api/me")).json()).roles).toEqual(["reviewer"]);
  });

  it("refuses a link used twice, an expired link, a replaced link and an unknown link, in words", async () => {
    const lead = await signedIn(demo.email("lead"), demo.password);
    const { user, link } = await invite(lead, { email: uniqueEmail("twice"), name: "Twice", roles: ["technician"] });
    const visitor = new Client();
    expect((await visitor.post(`/api/invites/${tokenOf(link)}`, { password: "first password" })).status).toBe(200);
    const reused = await visitor.post(`/api/invites/${tokenOf(link)}`, { password: "second password" });
    expect(reused.status).toBe(410);
    expect((await reused.json()).error.message).toMatch(/already been used/);
    const page = await visitor.get(new URL(link).pathname);
    expect(await page.text()).toContain("already been used");

    const second = await invite(lead, { email: uniqueEmail("late"), name: "Late", roles: ["technician"] });
    await db()("invites")
      .where({ token_hash: hashToken(tokenOf(second.link)) })
      .update({ expires_at: new Date(Date.now() - 1000) });
    const expired = await visitor.post(`/api/invites/${tokenOf(second.link)}`, { password: "some password" });
    expect(expired.status).toBe(410);
    expect((await expired.json()).error.message).toMatch(/expired/);

    const resent = await lead.post(`/api/users/${second.user.id}/invite`);
    expect(resent.status).toBe(200);
    const mails = await waitForMail(second.user.email, 2);
    const newest = inviteLink(mails[0]);
    expect(newest).not.toBe(second.link);
    expect((await visitor.post(`/api/invites/${tokenOf(newest)}`, { password: "some password" })).status).toBe(200);

    const unknown = await visitor.get("/api/invites/not-a-real-token");
    expect(unknown.status).toBe(404);
    expect((await unknown.json()).error.message).toMatch(/not valid/);
    expect(user.status).toBe("invited");
  });

  it("refuses a too-short password with a field error and keeps the link usable", async () => {
    const lead = await signedIn(demo.email("lead"), demo.password);
    const { link } = await invite(lead, { email: uniqueEmail("short"), name: "Short", roles: ["technician"] });
    const res = await new Client().post(`/api/invites/${tokenOf(link)}`, { password: "short" });
    expect(res.status).toBe(422);
    expect((await res.json()).error.fields).toEqual({ password: "Password must be at least 10 characters." });
    expect((await new Client().get(`/api/invites/${tokenOf(link)}`)).status).toBe(200);
  });

  it("invites a manufacturer into an organisation, and refuses one without", async () => {
    const lead = await signedIn(demo.email("lead"), demo.password);
    const organisationId = await demoOrganisationId();
    const ok = await lead.post("/api/users", { email: uniqueEmail("maker"), name: "Maker", roles: ["manufacturer"], organisationId });
    expect(ok.status).toBe(201);
    const bad = await lead.post("/api/users", { email: uniqueEmail("maker"), name: "Maker", roles: ["manufacturer"] });
    expect(bad.status).toBe(422);
    expect((await bad.json()).error.fields.roles).toMatch(/must belong to an organisation/);
  });
});

describe("bad input to user management", () => {
  it("answers each kind of bad input with 422 in words and saves nothing", async () => {
    const lead = await signedIn(demo.email("lead"), demo.password);
    const longEmail = uniqueEmail("long");
    const scriptEmail = uniqueEmail("xss");

    const malformed = await lead.request("POST", "/api/users", { raw: "{ not json" });
    expect(malformed.status).toBe(422);
    expect((await malformed.json()).error.message).toBe("The request body is not valid JSON.");

    const missing = await lead.post("/api/users", {});
    expect(missing.status).toBe(422);
    expect(Object.keys((await missing.json()).error.fields).sort()).toEqual(["email", "name", "roles"]);

    const long = await lead.post("/api/users", { email: longEmail, name: "n".repeat(121), roles: ["technician"] });
    expect((await long.json()).error.fields.name).toBe("Name must be at most 120 characters.");

    const script = await lead.post("/api/users", { email: scriptEmail, name: "<script>alert(1)</script>", roles: ["technician"] });
    expect(script.status).toBe(422);
    expect((await script.json()).error.fields.name).toBe("Name cannot contain < or >.");

    const form = await lead.request("POST", "/api/users", { raw: "email=a", type: "text/plain" });
    expect(form.status).toBe(415);

    const dup = await lead.post("/api/users", { email: demo.email("technician"), name: "Again", roles: ["technician"] });
    expect(dup.status).toBe(409);
    expect((await dup.json()).error.fields.email).toBe("This e-mail is already in use.");

    const noSuch = await lead.patch("/api/users/not-a-uuid", { name: "X" });
    expect(noSuch.status).toBe(404);

    expect(await findUserByEmail(db(), longEmail)).toBeUndefined();
    expect(await findUserByEmail(db(), scriptEmail)).toBeUndefined();
    expect((await findUserByEmail(db(), demo.email("technician")))?.name).toBe("Demo Technician");
  });

  it("keeps a lead from locking themselves out", async () => {
    const self = await makeUser(["lead"]);
    const lead = await signedIn(self.email, self.password);
    const res = await lead.patch(`/api/users/${self.id}`, { active: false });
    expect(res.status).toBe(422);
    expect((await res.json()).error.message).toMatch(/cannot deactivate your own account/);
  });
});
