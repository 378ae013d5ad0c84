import { readFileSync } from "node:fs";
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb, db } from "@/lib/db";
import { signedIn, type Client } from "../helpers/app";
import { APP_URL, launch, screenshot, signInAs } from "../helpers/browser";
import { demo, makeUser } from "../helpers/fixtures";
import { newEdition, newRun, newSample, newSubmission, uniqueName } from "../helpers/intake";
import { plainMp4 } from "../helpers/media";
import { json, placeOnRun, read } from "../helpers/readings";

// The manufacturer's side of a release: two balls read through the real API and worker, signed off
// by the demo lead with their password, then the manufacturer opens the portal in Chromium. The
// clip is 25 frames a second: frames 5 → 35 take 1.2 s, clear of the test edition's 0.5 s minimum
// and 0.1 s guard band (example values, the test's own).
let browser: Browser;
let page: Page;
let lead: Client;
let released: { id: string; reference: string };
let waiting: { id: string; reference: string };

beforeAll(async () => {
  lead = await signedIn(demo.email("lead"), demo.password);
  const [ua, ub] = [await makeUser(["reviewer"]), await makeUser(["reviewer"])];
  const [a, b] = [await signedIn(ua.email, ua.password), await signedIn(ub.email, ub.password)];
  await newEdition(lead, { effectiveFrom: "2005-06-01", minAbsorptionS: 0.5, guardBandS: 0.1, roundSizes: [2], readingToleranceS: 0.5 });
  // A manufacturer of its own, so its list holds only this test's two submissions.
  const org = (
    await json<{ organisation: { id: string } }>(
      await lead.post("/api/organisations", { name: uniqueName("Quillmere Spheres (invented)"), contactEmails: [] }),
      201,
    )
  ).organisation.id;
  released = await newSubmission(lead, org, { receivedOn: "2005-06-02" });
  waiting = await newSubmission(lead, org, { receivedOn: "2005-06-02" });
  for (const serial of ["PR-1", "PR-2"]) {
    const sample = await newSample(lead, released.id, { serial, round: 1 });
    const placed = await placeOnRun(lead, (await newRun(lead, sample.id)).id, { file: plainMp4() });
    for (const id of placed.dropIds) {
      await read(a, id, 5, 35);
      await read(b, id, 5, 35);
    }
  }
  await json(await lead.post(`/api/submissions/${released.id}/signoff`, { password: demo.password }), 201);
  const maker = await makeUser(["manufacturer"], { organisationId: org, name: "Portal Reader" });
  browser = await launch();
  page = await (await browser.newContext({ viewport: { width: 1280, height: 900 }, acceptDownloads: true })).newPage();
  await signInAs(page, maker.email, maker.password);
  await page.waitForURL(`${APP_URL}/portal`);
}, 300_000);
afterAll(async () => {
  await browser?.close();
  await closeDb();
});

describe("the manufacturer sees released results in the portal", () => {
  it("the list links the released report; an unreleased submission says when results come", async () => {
    const list = page.getByRole("table", { name: /Submissions of/ });
    await list.waitFor();
    await expect.poll(() => list.getByRole("link", { name: `Released report (PDF) of ${released.reference}` }).count(), { timeout: 15_000 }).toBe(1);
    await screenshot(page, "portal-list-released");

    await page.goto(`${APP_URL}/portal/submissions/${waiting.id}`);
    const state = page.getByTestId("release-state");
    await state.waitFor();
    expect(await state.textContent()).toBe("The laboratory releases the results, with the test report, once a lead has reviewed and signed them off.");
    expect(await page.getByRole("link", { name: "Test report (PDF)" }).count()).toBe(0);
    await screenshot(page, "portal-not-released");
  });

  it("opens the released submission: the decision, each ball, the signature, the cautions, and the report downloads as a PDF", async () => {
    await page.goto(`${APP_URL}/portal`);
    await page.getByRole("link", { name: released.reference, exact: true }).click();
    await page.waitForURL(`${APP_URL}/portal/submissions/${released.id}`);
    const results = page.getByRole("region", { name: "Results and test report" });
    await results.getByTestId("portal-decision").waitFor({ timeout: 20_000 });
    expect(await results.getByTestId("portal-decision").textContent()).toBe("meets limit");
    expect(await results.textContent()).toMatch(/Decision after round 1: meets limit/);
    const rows = results.getByRole("table", { name: "Results of each sample ball" }).locator("tbody tr");
    expect(await rows.count()).toBe(2);
    expect(await rows.first().textContent()).toContain("1.2 s");
    const leadName = (
      await db()("users")
        .where({ email: demo.email("lead") })
        .first("name")
    ).name;
    expect(await results.textContent()).toContain(`Signed off by${leadName}When`);
    expect(await results.textContent()).toMatch(/Meaningresults reviewed and releasedRevision1/);
    expect(await results.getByText("The governing specification and the testing laboratory").count()).toBe(1);
    await screenshot(page, "portal-released-submission");

    const link = results.getByRole("link", { name: "Test report (PDF)" });
    const [download] = await Promise.all([page.waitForEvent("download"), link.click()]);
    expect(download.suggestedFilename()).toBe(`test-report-${released.reference}.pdf`);
    expect(
      readFileSync((await download.path())!)
        .subarray(0, 5)
        .toString("latin1"),
    ).toBe("%PDF-");
    // The same link, asked with the manufacturer's session: a PDF, not a refusal.
    const res = await page.request.get(`${APP_URL}${await link.getAttribute("href")}`);
    expect(res.status()).toBe(200);
    expect(res.headers()["content-type"]).toBe("application/pdf");
    const csv = await page.request.get(`${APP_URL}${await results.getByRole("link", { name: "Ball results (CSV)" }).getAttribute("href")}`);
    expect(csv.status()).toBe(200);
    expect((await csv.text()).split("\r\n").filter(Boolean)).toHaveLength(3);
  }, 60_000);
});
