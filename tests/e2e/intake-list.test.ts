import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb, db } from "@/lib/db";
import { listOrganisations } from "@/lib/organisations/queries";
import { signedIn } from "../helpers/app";
import { APP_URL, launch, screenshot, signInAs } from "../helpers/browser";
import { demo } from "../helpers/fixtures";
import { newRun, newSample, newSubmission } from "../helpers/intake";

let browser: Browser;
beforeAll(async () => {
  browser = await launch();
});
afterAll(async () => {
  await browser?.close();
  await closeDb();
});

describe("intake screens: flagged runs in the list, and the weight field's width", () => {
  it("the submissions list shows how many runs are flagged, for staff", async () => {
    const lead = await signedIn(demo.email("lead"), demo.password);
    const s = await newSubmission(lead, (await listOrganisations(db()))[0].id);
    const sample = await newSample(lead, s.id);
    // 27 °C is outside every demo edition's surface window; 22 °C is inside.
    await newRun(lead, sample.id, { surfaceTemp: { value: 27, unit: "C" } });
    await newRun(lead, sample.id);
    const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    await signInAs(page, demo.email("technician"), demo.password);
    await page.waitForURL(`${APP_URL}/overview`);
    await page.goto(`${APP_URL}/submissions?q=${s.reference}`);
    const row = page.getByRole("table", { name: /Submissions/ }).getByRole("row", { name: new RegExp(s.reference) });
    await row.getByText("1 flagged").waitFor();
    await screenshot(page, "intake-list-flagged");
    await page.close();
  });

  it("the weight number keeps a usable width beside its unit picker, at every width", async () => {
    const lead = await signedIn(demo.email("lead"), demo.password);
    const s = await newSubmission(lead, (await listOrganisations(db()))[0].id);
    const page = await browser.newPage();
    await signInAs(page, demo.email("technician"), demo.password);
    await page.waitForURL(`${APP_URL}/overview`);
    for (const width of [360, 800, 1024, 1280]) {
      await page.setViewportSize({ width, height: 900 });
      await page.goto(`${APP_URL}/submissions/${s.id}`);
      const form = page.getByRole("region", { name: "Add a sample" });
      await form.getByLabel("Unit of weight").waitFor();
      // Both boxes from one layout pass, so a panel loading elsewhere cannot move one between the two reads.
      const [weight, unit] = await form.evaluate((el) =>
        ["#sample-weight", "#sample-weight-unit"].map((sel) => {
          const r = el.querySelector(sel)!.getBoundingClientRect();
          return { width: r.width, y: r.y };
        }),
      );
      // 8rem holds about eight digits at the form's font size.
      expect(weight!.width, `at ${width} px`).toBeGreaterThanOrEqual(128);
      expect(unit!.width, `at ${width} px`).toBeGreaterThanOrEqual(64);
      expect(Math.abs(unit!.y - weight!.y), `unit beside the number at ${width} px`).toBeLessThan(4);
    }
    await page.setViewportSize({ width: 1024, height: 900 });
    await screenshot(page, "intake-weight-1024");
    await page.close();
  });
});
