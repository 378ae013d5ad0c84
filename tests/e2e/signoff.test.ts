import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb } from "@/lib/db";
import { signedIn, type Client } from "../helpers/app";
import { APP_URL, launch, screenshot, signInAs } from "../helpers/browser";
import { demo, demoOrganisationId, makeUser } from "../helpers/fixtures";
import { newEdition, newRun, newSample, newSubmission } from "../helpers/intake";
import { plainMp4 } from "../helpers/media";
import { json, placeOnRun, read } from "../helpers/readings";

// The lead's desk in the browser: rule a discrepancy, sign the results off with the password, see
// the lock and a refused change, re-open with a reason, and follow it all on the audit page. Data
// through the real API: the test's own edition (example values: 0.5 s minimum, 0.1 s guard band,
// rounds of 2 then 3, 0.5 s reading tolerance) and two balls on 2 s clips at 25 frames a second,
// read 5 → 30 (1.0 s) by both readers, except one drop the second reader marks 5 → 48 (1.72 s).
let browser: Browser;
let page: Page;
let lead: Client;
let a: Client;
let submissionId: string;
let reference: string;
let runId: string;
let disputed: string;
const locked = (rev: number) => `Submission ${reference} is signed off (revision ${rev}). A lead must re-open it first.`;

beforeAll(async () => {
  lead = await signedIn(demo.email("lead"), demo.password);
  const [ua, ub] = [await makeUser(["reviewer"], { name: "Reader Ash" }), await makeUser(["reviewer"], { name: "Reader Birch" })];
  a = await signedIn(ua.email, ua.password);
  const b = await signedIn(ub.email, ub.password);
  await newEdition(lead, { effectiveFrom: "2005-06-01", minAbsorptionS: 0.5, guardBandS: 0.1, roundSizes: [2, 3], readingToleranceS: 0.5 });
  ({ id: submissionId, reference } = await newSubmission(lead, await demoOrganisationId(), { receivedOn: "2005-06-02" }));
  for (const serial of ["LD-1", "LD-2"]) {
    const sample = await newSample(lead, submissionId, { serial, round: 1 });
    const placed = await placeOnRun(lead, (await newRun(lead, sample.id)).id, { file: plainMp4() });
    runId ??= placed.runId;
    for (const id of placed.dropIds) {
      await read(a, id, 5, 30);
      const d = await read(b, id, 5, disputed ? 30 : 48);
      if (!disputed) {
        expect(d.state).toBe("discrepancy");
        disputed = id;
      }
    }
  }
  browser = await launch();
  page = await (await browser.newContext({ viewport: { width: 1440, height: 1000 } })).newPage();
  await signInAs(page, demo.email("lead"), demo.password);
  await page.waitForURL(`${APP_URL}/overview`);
}, 240_000);
afterAll(async () => {
  await browser?.close();
  await closeDb();
});

describe("the lead's desk", () => {
  it("the lead's navigation keeps to one line at 1440 px, administration under one menu", async () => {
    const nav = page.getByRole("navigation", { name: "Main" });
    const first = await nav.getByRole("link", { name: "Overview" }).boundingBox();
    const last = await nav.getByRole("link", { name: "Help" }).boundingBox();
    expect(last!.y).toBe(first!.y);
    await nav.getByRole("button", { name: "Administration" }).click();
    await nav.getByRole("link", { name: "Audit" }).waitFor();
    await screenshot(page, "signoff-nav-menu");
    await nav.getByRole("link", { name: "Audit" }).focus();
    await page.keyboard.press("Escape");
    expect(await nav.getByRole("link", { name: "Audit" }).count()).toBe(0);
    expect(await page.evaluate(() => document.activeElement?.textContent)).toBe("Administration");
  });

  it("signing off while a drop is in discrepancy is refused in words, and the password stays typed", async () => {
    await page.goto(`${APP_URL}/submissions/${submissionId}/results`);
    const panel = page.getByRole("region", { name: "Sign-off" });
    // Said before any password is typed, and refused again by the server if the lead signs anyway.
    await panel
      .getByRole("status")
      .filter({ hasText: /^Not ready to sign: The decision is still pending\./ })
      .waitFor();
    const password = panel.getByLabel("Your password, to sign");
    await password.fill(demo.password);
    await panel.getByRole("button", { name: "Sign off results" }).click();
    // Ball LD-1 has two settled drops of three: its result, and so the decision, waits for the third.
    await panel
      .getByRole("alert")
      .filter({ hasText: /decision is still pending|not settled yet/ })
      .waitFor();
    expect(await password.inputValue()).toBe(demo.password);
    await screenshot(page, "signoff-refused-unsettled");
  });

  it("rules the discrepancy: accepts the second reading with a reason", async () => {
    await page.goto(`${APP_URL}/drops/${disputed}/ruling`);
    const form = page.getByRole("region", { name: "Ruling" });
    await form.getByLabel("Accept the second reading").check();
    await form.getByLabel("Reason for the ruling").fill("The second reader's clear frame is where the film has gone.");
    page.once("dialog", (d) => void d.accept());
    await form.getByRole("button", { name: "Record the ruling" }).click();
    await form.getByText(/Ruled by .*the second reading, 1\.720 s/).waitFor();
    await screenshot(page, "signoff-ruling-made");
  });

  it("signs off with the password after a wrong one is refused in words, and sees the lock", async () => {
    await page.goto(`${APP_URL}/submissions/${submissionId}/results`);
    const panel = page.getByRole("region", { name: "Sign-off" });
    await expect
      .poll(() => panel.getByTestId("signoff-state").textContent(), { timeout: 20_000 })
      .toBe("Revision 1, not signed off: changes can still be made.");
    expect(await panel.getByText("results reviewed and released").first().isVisible()).toBe(true);
    const password = panel.getByLabel("Your password, to sign");
    await password.fill("not my password");
    await panel.getByRole("button", { name: "Sign off results" }).click();
    await panel.getByText("That password is not right: the signature was not made.").waitFor();
    expect(await password.inputValue()).toBe("not my password");
    await screenshot(page, "signoff-wrong-password");

    await password.fill(demo.password);
    await panel.getByRole("button", { name: "Sign off results" }).click();
    await expect.poll(() => panel.getByTestId("signoff-state").textContent(), { timeout: 20_000 }).toMatch(/^Locked: signed off as revision 1\./);
    const signature = panel.getByTestId("signature");
    expect(await signature.textContent()).toMatch(/Revision 1 signed off by .*Meaning of the signature: “results reviewed and released”\.First signature/);
    // The decision panel no longer asks for a sign-off that has happened.
    await page
      .getByRole("region", { name: /^Decision after round/ })
      .getByText("Nothing: the results are signed off and released.", { exact: false })
      .waitFor();
    await screenshot(page, "signoff-signed");

    await page.goto(`${APP_URL}/submissions/${submissionId}`);
    await expect.poll(() => page.getByTestId("lock-notice").textContent(), { timeout: 20_000 }).toMatch(/^Locked: signed off as revision 1\./);
    await screenshot(page, "signoff-submission-locked");
  });

  it("after sign-off the run page offers no change and says why; a reading change is refused with the reason", async () => {
    // The run page no longer offers "Edit conditions" only to refuse the save: it shows the lock instead.
    await page.goto(`${APP_URL}/runs/${runId}`);
    await page
      .getByTestId("run-lock-notice")
      .filter({ hasText: locked(1) })
      .waitFor({ timeout: 20_000 });
    expect(await page.getByRole("button", { name: "Edit conditions" }).count()).toBe(0);
    await screenshot(page, "signoff-run-change-refused");
    const res = await a.post(`/api/drops/${disputed}/readings`, { dispenseFrame: 6 });
    expect((await json<{ error: { message: string } }>(res, 409)).error.message).toBe(locked(1));
  });

  it("re-opens with a reason (a short one is refused), as revision 2", async () => {
    await page.goto(`${APP_URL}/submissions/${submissionId}/results`);
    const panel = page.getByRole("region", { name: "Sign-off" });
    const reason = panel.getByLabel("Reason for re-opening");
    await reason.fill("typo");
    await panel.getByRole("button", { name: "Re-open as revision 2" }).click();
    await panel.getByText("at least 10 characters").waitFor();
    await reason.fill("The second ball's run conditions are to be corrected.");
    await panel.getByRole("button", { name: "Re-open as revision 2" }).click();
    await expect
      .poll(() => panel.getByTestId("signoff-state").textContent(), { timeout: 20_000 })
      .toBe("Revision 2, not signed off: changes can still be made.");
    expect(await panel.getByTestId("reopening").textContent()).toMatch(
      /Re-opened as revision 2 by .*Reason: The second ball's run conditions are to be corrected\./,
    );
    await screenshot(page, "signoff-reopened");
  });

  it("the audit page shows the record's events, filters by action, and each change field by field", async () => {
    await page.getByRole("link", { name: "Audit trail of this submission" }).click();
    await page.waitForURL(/\/audit\?/);
    const events = page.getByTestId("audit-event");
    await expect.poll(() => events.filter({ hasText: "submission.signed_off" }).count(), { timeout: 20_000 }).toBe(1);
    expect(await events.filter({ hasText: "submission.reopened" }).count()).toBe(1);
    const signed = events.filter({ hasText: "submission.signed_off" });
    const status = signed.locator('tr[data-key="status"]');
    expect(await status.getAttribute("data-change")).toBe("changed");
    expect(await signed.locator('tr[data-key="meaning"]').getAttribute("data-change")).toBe("added");
    expect((await status.locator("td").allInnerTexts())[1]).toBe("released");
    expect(await signed.locator('tr[data-key="meaning"] td').last().textContent()).toBe("results reviewed and released");
    await screenshot(page, "audit-submission");

    await page.getByRole("button", { name: "Clear filters" }).click();
    await page.waitForURL((u) => !u.search.includes("entity"));
    await page.getByLabel("Action (or its start, e.g. reading.)").fill("ruling.");
    await page.getByRole("button", { name: "Show events" }).click();
    await page.waitForURL(/action=ruling/);
    // The previous list stays on screen until the filtered one arrives.
    await expect
      .poll(() => events.evaluateAll((els) => els.length > 0 && els.every((e) => e.textContent?.includes("ruling."))), { timeout: 20_000 })
      .toBe(true);
    expect(await events.filter({ hasText: "The second reader's clear frame is where the film has gone." }).count()).toBe(1);
    await screenshot(page, "audit-rulings");
  });
});
