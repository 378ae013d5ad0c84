import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { demo, uniqueEmail } from "../helpers/fixtures";
import { APP_URL, launch, screenshot, signInAs } from "../helpers/browser";

let browser: Browser;
beforeAll(async () => {
  browser = await launch();
});
afterAll(() => browser?.close());

describe("a lead invites a colleague in the browser", () => {
  it("invites, opens the link from the outbox, sets a password and lands signed in", async () => {
    const email = uniqueEmail("colleague");
    const lead = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    await signInAs(lead, demo.email("lead"), demo.password);
    await lead.waitForURL(`${APP_URL}/overview`);
    await lead.getByRole("button", { name: "Administration" }).click();
    await lead.getByRole("link", { name: "Users" }).click();
    const form = lead.getByRole("region", { name: "Invite a person" });
    await form.getByLabel("Name").fill("Casey Colleague");
    await form.getByLabel("E-mail").fill(email);
    await form.getByRole("checkbox", { name: "Reviewer" }).check();
    await form.getByRole("checkbox", { name: "Technician" }).uncheck();
    await form.getByRole("button", { name: "Send invitation" }).click();
    await lead.getByText(`Invitation sent to ${email}.`).waitFor();
    await screenshot(lead, "invite-sent");

    await lead.getByRole("button", { name: "Administration" }).click();
    await lead.getByRole("link", { name: "Outbox" }).click();
    const message = lead.getByRole("listitem").filter({ hasText: email }).first();
    await message.waitFor();
    const link = await message.getByRole("link").getAttribute("href");
    expect(link).toMatch(/\/invite\//);
    await screenshot(lead, "outbox");

    const visitor = await browser.newPage();
    await visitor.goto(link!);
    await visitor.getByText("Welcome, Casey Colleague").waitFor();
    await visitor.getByLabel("New password").fill("casey's new password");
    await visitor.getByLabel("Repeat the password").fill("casey's new password");
    await screenshot(visitor, "invite-accept");
    await visitor.getByRole("button", { name: "Set password and sign in" }).click();
    await visitor.waitForURL(`${APP_URL}/overview`);
    expect(await visitor.getByText("Casey Colleague").first().isVisible()).toBe(true);
    await screenshot(visitor, "invite-signed-in");
  });
});
