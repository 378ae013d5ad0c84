import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { demo } from "../helpers/fixtures";
import { APP_URL, launch, screenshot, signInAs } from "../helpers/browser";

let browser: Browser;
beforeAll(async () => {
  browser = await launch();
});
afterAll(() => browser?.close());

const CASES = [
  { role: "technician", home: "/overview", nav: ["Overview", "Submissions", "Editions", "Help"] },
  { role: "reviewer", home: "/overview", nav: ["Overview", "Submissions", "Reading queue", "Help"] },
  // A lead's administration sits under one menu, so the bar keeps to one line.
  {
    role: "lead",
    home: "/overview",
    nav: ["Overview", "Submissions", "Reading queue", "Discrepancies", "Reviewer agreement", "Help"],
    menu: ["Editions", "Organisations", "Users", "Audit", "Outbox"],
  },
  { role: "manufacturer", home: "/portal", nav: ["Our submissions", "Help"] },
] as const;

describe("signing in as each role", () => {
  for (const c of CASES) {
    it(`${c.role} lands on ${c.home} and sees only their navigation`, async () => {
      const page = await browser.newPage({ viewport: { width: 1280, height: 800 } });
      await signInAs(page, demo.email(c.role), demo.password);
      await page.waitForURL(`${APP_URL}${c.home}`);
      const nav = page.getByRole("navigation", { name: "Main" });
      await nav.getByRole("link").first().waitFor();
      expect(await nav.getByRole("link").allInnerTexts()).toEqual([...c.nav]);
      if ("menu" in c) {
        await nav.getByRole("button", { name: "Administration" }).click();
        expect(await nav.getByRole("link").allInnerTexts()).toEqual([...c.nav.slice(0, -1), ...c.menu, ...c.nav.slice(-1)]);
        const bar = await nav.getByRole("link", { name: "Overview" }).boundingBox();
        const help = await nav.getByRole("link", { name: "Help" }).boundingBox();
        expect(help!.y).toBe(bar!.y); // one line at 1280 px
      }
      expect(await page.getByText("governing specification").first().isVisible()).toBe(true);
      await screenshot(page, `home-${c.role}`);
      await page.close();
    });
  }

  it("a signed-out visit to a staff page lands on sign-in, then returns there", async () => {
    const page = await browser.newPage();
    await page.goto(`${APP_URL}/users`);
    expect(new URL(page.url()).pathname).toBe("/sign-in");
    await screenshot(page, "signed-out-redirect");
    await page.getByLabel("E-mail").fill(demo.email("lead"));
    await page.getByLabel("Password").fill(demo.password);
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL(`${APP_URL}/users`);
    await page.getByRole("table").waitFor();
    await screenshot(page, "users-page");
    await page.close();
  });

  it("a signed-out visit to a mailed link (with its query) lands on that page after sign-in", async () => {
    for (const target of ["/discrepancies", "/audit?action=submission."]) {
      const page = await browser.newPage();
      await page.goto(`${APP_URL}${target}`);
      expect(new URL(page.url()).pathname).toBe("/sign-in");
      await page.getByLabel("E-mail").fill(demo.email("lead"));
      await page.getByLabel("Password").fill(demo.password);
      await page.getByRole("button", { name: "Sign in" }).click();
      await page.waitForURL(`${APP_URL}${target}`);
      await page.getByRole("heading", { level: 1 }).waitFor();
      await page.close();
    }
  });

  it("a wrong password is explained in words on the form", async () => {
    const page = await browser.newPage();
    await signInAs(page, demo.email("reviewer"), "not-the-password");
    // Next's route announcer is an alert too: find ours by its words.
    const alert = page.getByRole("alert").filter({ hasText: "e-mail or password is not right" });
    await alert.waitFor();
    expect(await alert.isVisible()).toBe(true);
    await screenshot(page, "sign-in-wrong-password");
    await page.close();
  });

  it("a manufacturer cannot open a staff page", async () => {
    const page = await browser.newPage();
    await signInAs(page, demo.email("manufacturer"), demo.password);
    await page.waitForURL(`${APP_URL}/portal`);
    await page.goto(`${APP_URL}/users`);
    await page.waitForURL(`${APP_URL}/portal`);
    await page.getByRole("heading", { name: "Our submissions" }).waitFor();
    expect(await page.getByRole("heading", { name: "Users" }).count()).toBe(0);
    await page.close();
  });
});
