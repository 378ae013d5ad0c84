import { randomBytes } from "node:crypto";
import type { Browser, BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { demo } from "../helpers/fixtures";
import { APP_URL, launch, screenshot, signInAs } from "../helpers/browser";

let browser: Browser;
const contexts: BrowserContext[] = [];
beforeAll(async () => {
  browser = await launch();
});
afterAll(async () => {
  for (const c of contexts) await c.close();
  await browser?.close();
});

async function signedInPage(role: "technician" | "lead", width: number): Promise<Page> {
  const context = await browser.newContext({ viewport: { width, height: 900 } });
  contexts.push(context);
  const page = await context.newPage();
  await signInAs(page, demo.email(role), demo.password);
  await page.waitForURL(`${APP_URL}/overview`);
  return page;
}

/** A datetime-local value, in the zone the browser shares with this process. */
function localInput(d: Date): string {
  const p = (n: number) => String(n).padStart(2, "0");
  return `${d.getFullYear()}-${p(d.getMonth() + 1)}-${p(d.getDate())}T${p(d.getHours())}:${p(d.getMinutes())}`;
}

const tag = randomBytes(3).toString("hex").toUpperCase();
const model = `Tidewater Orb ${tag} (invented)`;
const serialOz = `E2E-${tag}-01`;
const serialCsv = `E2E-${tag}-02`;
const UUID = "[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}";
let technician: Page;
let submissionUrl = "";
let runUrl = "";

describe("intake in the browser: a submission, its samples, a flagged run and its acceptance", () => {
  it("a technician logs a submission and adds one sample by form (in oz) and one by CSV", async () => {
    technician = await signedInPage("technician", 1280);
    await technician.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Submissions" }).click();
    await technician.waitForURL(`${APP_URL}/submissions`);
    await technician.getByRole("table", { name: /Submissions/ }).waitFor();
    await screenshot(technician, "intake-list");

    await technician.getByRole("link", { name: "New submission" }).click();
    const form = technician.getByRole("form", { name: "New submission" });
    await form.waitFor();
    // The organisation list arrives from the API after the form appears.
    await form.locator("option", { hasText: "Tallowby Ball Works (invented)" }).waitFor({ state: "attached" });
    await form.getByLabel("Organisation").selectOption({ label: "Tallowby Ball Works (invented)" });
    await form.getByLabel("Model name").fill(model);
    await form.getByRole("radio", { name: "Approval" }).check();
    await form.getByRole("checkbox", { name: "15 lb" }).check();
    await form.getByRole("checkbox", { name: "16 lb" }).check();
    // "Received on" starts at today, which is what this lab visit is.
    expect(await form.getByLabel("Received on").inputValue()).toMatch(/^\d{4}-\d{2}-\d{2}$/);
    await screenshot(technician, "intake-new-submission");
    await form.getByRole("button", { name: "Create submission" }).click();
    await technician.waitForURL(new RegExp(`/submissions/${UUID}$`));
    submissionUrl = technician.url();
    await technician.getByRole("heading", { name: model }).waitFor();

    const single = technician.getByRole("region", { name: "Add a sample" });
    await single.getByLabel("Serial number").fill(serialOz);
    await single.getByLabel("Weight", { exact: true }).fill("240");
    await single.getByLabel("Unit of weight").selectOption("oz");
    await single.getByLabel("Acclimation started at").fill(localInput(new Date(Date.now() - 30 * 3_600_000)));
    await single.getByRole("button", { name: "Add sample" }).click();
    await single.getByText(`Sample ${serialOz} was added to round 1.`).waitFor();
    const round1 = technician.getByRole("region", { name: /^Round 1/ });
    // 240 oz is 15 lb exactly: 6803.89 g.
    await round1
      .getByRole("row", { name: new RegExp(serialOz) })
      .getByText("6803.89 g")
      .waitFor();
    await screenshot(technician, "intake-sample-added");

    const bulk = technician.getByRole("region", { name: "Import samples from CSV" });
    await bulk.getByLabel("CSV rows").fill(`serial,weight,unit\n${serialCsv},heavy,g`);
    await bulk.getByRole("button", { name: "Import samples" }).click();
    await bulk.getByRole("alert").filter({ hasText: "nothing was saved" }).waitFor();
    await bulk.getByRole("list", { name: "Rows to correct" }).getByText('Line 2: The weight "heavy" is not a number.').waitFor();
    await screenshot(technician, "intake-import-refused");

    await bulk.getByLabel("CSV rows").fill(`serial,weight,unit\n${serialCsv},7250.5,g`);
    await bulk.getByRole("button", { name: "Import samples" }).click();
    await bulk.getByText("1 sample was imported.").waitFor();
    await round1.getByRole("rowheader", { name: serialCsv }).waitFor();
    expect(await round1.getByRole("rowheader").allInnerTexts()).toEqual(expect.arrayContaining([serialOz, serialCsv]));
    await screenshot(technician, "intake-samples");
  });

  it("the technician records a run whose surface temperature is outside the edition's window, and sees the warning", async () => {
    await technician.goto(submissionUrl);
    await technician.getByRole("link", { name: `Record run on sample ${serialOz}` }).click();
    await technician.waitForURL(new RegExp(`/samples/${UUID}/runs/new$`));
    const form = technician.getByRole("form", { name: "Run conditions" });
    await form.getByLabel("Camera").fill("CAM-E2E");
    await form.getByLabel("Room temperature", { exact: true }).fill("22");
    // 80 °F is 26.7 °C: above the demo edition's window of 20–24 °C.
    await form.getByLabel("Surface temperature", { exact: true }).fill("80");
    await form.getByLabel("Unit of surface temperature").selectOption("F");
    await form.getByLabel("Preparation method").fill("Wiped, abraded, wiped (invented)");
    await form.getByLabel("Reading 1", { exact: true }).fill("0.42");
    await form.getByLabel("Reading 2", { exact: true }).fill("0.45");
    await form.getByLabel("Reading 3", { exact: true }).fill("0.44");
    await form.getByText("3 readings: mean 0.437 µm, SD 0.015 µm.").waitFor();
    await form.getByLabel("Oil lot").fill("E2E-OIL-1");
    await form.getByLabel("Dispenser check", { exact: true }).fill("12.0");
    await screenshot(technician, "intake-run-form");
    await form.getByRole("button", { name: "Save run" }).click();

    await technician.waitForURL(new RegExp(`/runs/${UUID}$`));
    runUrl = technician.url();
    const checks = technician.getByRole("region", { name: "Condition checks" });
    await checks.getByText("Surface temperature 26.7 °C is outside the edition's window of 20–24 °C.").waitFor();
    await checks.getByText(/counts only once a lead accepts it/).waitFor();
    // Accepting is a lead's call: a technician is not offered the form.
    expect(await technician.getByRole("button", { name: "Accept anyway" }).count()).toBe(0);
    await screenshot(technician, "intake-run-flagged");

    await technician.goto(submissionUrl);
    await technician.getByRole("status").filter({ hasText: "1 run has conditions outside the edition's limits." }).waitFor();
    await screenshot(technician, "intake-submission-flagged");
  });

  it("a lead opens the run, accepts it with a reason, and the acceptance is shown", async () => {
    const lead = await signedInPage("lead", 820);
    await lead.goto(runUrl);
    const checks = lead.getByRole("region", { name: "Condition checks" });
    const accept = checks.getByRole("form", { name: "Accept anyway" });
    await accept.getByRole("button", { name: "Accept anyway" }).click();
    await accept.getByText("Write the reason in a sentence (at least 10 characters).").waitFor();

    const reason = "Room thermometer re-checked; the ball surface was warm from the lamp (invented).";
    await accept.getByLabel("Reason for accepting").fill(reason);
    await screenshot(lead, "intake-accept-form");
    await accept.getByRole("button", { name: "Accept anyway" }).click();
    await checks.getByText(/^Accepted by Demo Lead on .+: Room thermometer re-checked/).waitFor();
    expect(await checks.getByText(reason, { exact: false }).isVisible()).toBe(true);
    expect(await lead.getByRole("form", { name: "Accept anyway" }).count()).toBe(0);
    await screenshot(lead, "intake-run-accepted");

    await lead.goto(submissionUrl);
    await lead.getByRole("heading", { name: model }).waitFor();
    expect(await lead.getByText("1 run has conditions outside the edition's limits.").count()).toBe(0);
    await lead.getByText(/Accepted by Demo Lead: Room thermometer re-checked/).waitFor();
    await screenshot(lead, "intake-submission-accepted");
  });
});
