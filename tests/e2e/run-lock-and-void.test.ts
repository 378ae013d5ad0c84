import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb } from "@/lib/db";
import { signedIn, type Client } from "../helpers/app";
import { APP_URL, launch, screenshot, signInAs } from "../helpers/browser";
import { demo, demoOrganisationId, makeUser } from "../helpers/fixtures";
import { newEdition, newRun, newSample, newSubmission } from "../helpers/intake";
import { plainMp4 } from "../helpers/media";
import { json, placeOnRun, read } from "../helpers/readings";

// A signed-off submission's run page offers no form that would only be refused, and says why; a
// lead voids a run with a reason on its page. The test's own edition (example values: 0.5 s
// minimum, 0.1 s guard band, rounds of 2 then 3) and two balls of 1.2 s drops, signed off.
let browser: Browser;
let page: Page;
let lead: Client;
let reference: string;
let signedRun: string;
let signedSample: string;
let otherSubmission: string;
let mistake: string;

beforeAll(async () => {
  lead = await signedIn(demo.email("lead"), demo.password);
  const [ua, ub] = [await makeUser(["reviewer"]), await makeUser(["reviewer"])];
  const [a, b] = [await signedIn(ua.email, ua.password), await signedIn(ub.email, ub.password)];
  await newEdition(lead, { effectiveFrom: "2007-04-01", minAbsorptionS: 0.5, guardBandS: 0.1, roundSizes: [2, 3], readingToleranceS: 0.5 });
  const s = await newSubmission(lead, await demoOrganisationId(), { receivedOn: "2007-04-02" });
  reference = s.reference;
  for (const serial of ["LK-1", "LK-2"]) {
    const sample = await newSample(lead, s.id, { serial, round: 1 });
    const placed = await placeOnRun(lead, (await newRun(lead, sample.id)).id, { file: plainMp4() });
    signedRun ??= placed.runId;
    signedSample ??= sample.id;
    for (const id of placed.dropIds) {
      await read(a, id, 5, 35);
      await read(b, id, 5, 35);
    }
  }
  await json(await lead.post(`/api/submissions/${s.id}/signoff`, { password: demo.password }), 201);
  otherSubmission = (await newSubmission(lead, await demoOrganisationId())).id;
  const sample = await newSample(lead, otherSubmission, { serial: "VD-1" });
  await newRun(lead, sample.id, { testedAt: new Date(Date.now() - 3_600_000).toISOString() });
  mistake = (await newRun(lead, sample.id)).id;
  browser = await launch();
  page = await (await browser.newContext({ viewport: { width: 1280, height: 1000 } })).newPage();
  await signInAs(page, demo.email("lead"), demo.password);
  await page.waitForURL(`${APP_URL}/overview`);
}, 240_000);
afterAll(async () => {
  await browser?.close();
  await closeDb();
});

describe("a signed-off submission's forms", () => {
  it("the run page shows the lock and its reason, and no edit, upload, placement or void form", async () => {
    await page.goto(`${APP_URL}/runs/${signedRun}`);
    const notice = page.getByTestId("run-lock-notice");
    await notice.waitFor({ timeout: 20_000 });
    expect(await notice.textContent()).toContain(`Submission ${reference} is signed off (revision 1). A lead must re-open it first.`);
    await page.getByRole("heading", { name: "Recordings" }).waitFor();
    await page.getByRole("table", { name: /^Drops of this run/ }).waitFor({ timeout: 20_000 });
    await page.getByRole("table", { name: "Recordings of this run" }).waitFor({ timeout: 20_000 });
    expect(await page.getByRole("button", { name: "Edit conditions" }).count()).toBe(0);
    expect(await page.locator("input[type=file]").count()).toBe(0);
    expect(await page.getByRole("button", { name: /Void this run|Place|Save placement/ }).count()).toBe(0);
    expect(await page.locator("form button:not([disabled]), form input:not([disabled]):not([type=hidden])").count()).toBe(0);
    await screenshot(page, "run-locked");
  });

  it("recording a new run on a ball of it shows the reason instead of the form", async () => {
    await page.goto(`${APP_URL}/samples/${signedSample}/runs/new`);
    await page.getByText(`Submission ${reference} is signed off (revision 1). A lead must re-open it first.`).waitFor({ timeout: 20_000 });
    expect(await page.getByRole("button", { name: /Record run|Save/ }).count()).toBe(0);
    await screenshot(page, "run-new-locked");
  });
});

describe("voiding a run", () => {
  it("a lead voids a run with a reason, after a short one is refused in words", async () => {
    await page.goto(`${APP_URL}/runs/${mistake}`);
    const form = page.getByRole("region", { name: "Void this run" });
    await form.waitFor({ timeout: 20_000 });
    const reason = form.getByLabel("Reason for voiding");
    await reason.fill("typo");
    await form.getByRole("button", { name: "Void this run" }).click();
    await form.getByText("at least 10 characters").waitFor();
    await reason.fill("Recorded against the wrong ball.");
    page.once("dialog", (d) => void d.accept());
    await form.getByRole("button", { name: "Void this run" }).click();
    const notice = page.getByTestId("void-notice");
    await notice.waitFor({ timeout: 20_000 });
    expect(await notice.textContent()).toMatch(/^Voided by .+ on .+\. It no longer counts\. Reason: Recorded against the wrong ball\.$/);
    expect(await page.getByRole("button", { name: "Edit conditions" }).count()).toBe(0);
    await screenshot(page, "run-voided");
  });

  it("the submission page lists the voided run as voided, with its reason", async () => {
    await page.goto(`${APP_URL}/submissions/${otherSubmission}`);
    const runs = page.getByRole("list", { name: "Runs of sample VD-1" });
    await runs.waitFor({ timeout: 20_000 });
    const voided = runs.getByRole("listitem").filter({ hasText: "Voided" });
    expect(await voided.count()).toBe(1);
    expect(await voided.textContent()).toContain("Recorded against the wrong ball.");
    await screenshot(page, "submission-voided-run");
  });
});
