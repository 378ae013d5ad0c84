import type { Browser, BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb } from "@/lib/db";
import { signedIn } from "../helpers/app";
import { APP_URL, launch, screenshot, signInAs } from "../helpers/browser";
import { demo, makeUser } from "../helpers/fixtures";
import { newSubmission, today, uniqueName } from "../helpers/intake";
import { json } from "../helpers/readings";

// A manufacturer answers the lab's request for more samples in the portal, and the lab sees the
// shipping details on its own submission page. The request itself is made through the API.
let browser: Browser;
const contexts: BrowserContext[] = [];
let maker: { email: string; password: string };
let submission: { id: string; reference: string };
const shipping = "Carrier: Example Freight (invented), tracking EF-7781, one box of 8 balls";

async function pageFor(email: string, password: string, home: string): Promise<Page> {
  const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
  contexts.push(context);
  const page = await context.newPage();
  await signInAs(page, email, password);
  await page.waitForURL(`${APP_URL}${home}`);
  return page;
}

beforeAll(async () => {
  browser = await launch();
  const lead = await signedIn(demo.email("lead"), demo.password);
  const org = (await json<{ organisation: { id: string } }>(await lead.post("/api/organisations", { name: uniqueName("Portal maker (invented)") }), 201))
    .organisation;
  maker = await makeUser(["manufacturer"], { organisationId: org.id, name: "Portal Maker" });
  submission = await newSubmission(lead, org.id, { receivedOn: today(), modelName: uniqueName("Harbour Glide (invented)") });
  const dueBy = new Date(Date.now() + 14 * 86_400_000).toISOString().slice(0, 10);
  await json(await lead.post(`/api/submissions/${submission.id}/sample-requests`, { count: 8, weight: "15 lb", dueBy, note: "Same cover as round 1." }), 201);
}, 60_000);
afterAll(async () => {
  for (const c of contexts) await c.close();
  await browser?.close();
  await closeDb();
});

describe("requests for more samples in the portal", () => {
  it("the manufacturer acknowledges with shipping details; a refusal first says what is missing and keeps the date", async () => {
    const page = await pageFor(maker.email, maker.password, "/portal");
    await page.getByRole("link", { name: submission.reference }).click();
    await page.waitForURL(`${APP_URL}/portal/submissions/${submission.id}`);
    const item = page.getByRole("listitem").filter({ has: page.getByRole("heading", { name: "Round 2: 8 sample balls, 15 lb" }) });
    await item.waitFor();
    await item.getByText("Waiting for your reply").waitFor();
    await screenshot(page, "portal-request-open");

    const form = page.getByRole("form", { name: "Acknowledge the request for round 2" });
    await form.getByLabel("Shipped on").fill(today());
    await form.getByRole("button", { name: "Acknowledge and send the details" }).click();
    await form.getByText("Shipping details is required.").first().waitFor();
    expect(await form.getByLabel("Shipped on").inputValue()).toBe(today());
    await screenshot(page, "portal-request-refused");

    await form.getByLabel("Shipping details").fill(shipping);
    await form.getByRole("button", { name: "Acknowledge and send the details" }).click();
    await item.getByText("Acknowledged", { exact: true }).waitFor();
    await item.getByText(shipping).waitFor();
    expect(await page.getByRole("form", { name: /Acknowledge the request/ }).count()).toBe(0);
    await screenshot(page, "portal-request-acknowledged");
  });

  it("the lab sees the shipping details on the submission", async () => {
    const page = await pageFor(demo.email("technician"), demo.password, "/overview");
    await page.goto(`${APP_URL}/submissions/${submission.id}`);
    const panel = page.getByRole("region", { name: "Requests for more samples" });
    await panel.getByText(shipping, { exact: false }).waitFor();
    expect(await panel.textContent()).toContain("Acknowledged by Portal Maker");
    await panel.scrollIntoViewIfNeeded();
    await screenshot(page, "lab-request-acknowledged");
  });

  it("the manufacturer finds the notices on the account page, essential ones always on", async () => {
    const page = await pageFor(maker.email, maker.password, "/portal");
    await page.getByRole("link", { name: "Your account" }).click();
    await page.waitForURL(`${APP_URL}/account`);
    const released = page.getByRole("checkbox", { name: /Results released/ });
    await released.waitFor();
    expect(await released.isChecked()).toBe(true);
    expect(await released.isDisabled()).toBe(true);
    await screenshot(page, "account-manufacturer");
  });

  it("a lead reads the sent mail, with the request's mail to the manufacturer", async () => {
    const page = await pageFor(demo.email("lead"), demo.password, "/overview");
    await page.goto(`${APP_URL}/account`);
    await page.getByRole("link", { name: "Sent mail" }).click();
    await page.waitForURL(`${APP_URL}/mail`);
    const row = page.getByRole("row").filter({ hasText: maker.email });
    await row.first().waitFor();
    expect(await row.first().textContent()).toContain(`${submission.reference}: please send 8 more samples for round 2`);
    await screenshot(page, "sent-mail");
  });
});
