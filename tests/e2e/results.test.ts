import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb, db } from "@/lib/db";
import { stopBoss } from "@/lib/jobs";
import { DEMO_BALLS, DEMO_READ_SUBMISSION } from "@/seeds/demo-results-plan";
import { ensureDemoReadings } from "../helpers/demo-readings";
import { APP_URL, launch, screenshot, signInAs } from "../helpers/browser";
import { demo } from "../helpers/fixtures";

// The results page of the demo's read submission: every drop of its ten balls read twice through
// the real worker and services (small recordings keep it quick), then opened by a lead.
let browser: Browser;
let page: Page;
let submissionId: string;

beforeAll(async () => {
  const r = await ensureDemoReadings();
  expect(r.problems).toEqual([]);
  submissionId = (await db()("submissions").where({ reference: DEMO_READ_SUBMISSION }).first("id")).id;
  browser = await launch();
  page = await (await browser.newContext({ viewport: { width: 1440, height: 1000 } })).newPage();
  await signInAs(page, demo.email("lead"), demo.password);
  await page.waitForURL(`${APP_URL}/overview`);
}, 900_000);
afterAll(async () => {
  await browser?.close();
  await stopBoss();
  await closeDb();
});

describe("the demo submission's results", () => {
  it("shows the decision, every ball, and both plots with their numbers", async () => {
    await page.goto(`${APP_URL}/submissions/${submissionId}`);
    await page.getByRole("link", { name: "Results and decision" }).click();
    await page.waitForURL(/\/results$/);
    const decision = page.getByRole("region", { name: /Decision after round 2/ });
    await expect.poll(() => decision.isVisible(), { timeout: 20_000 }).toBe(true);
    // Four ball means inside the 135–145 s guard band, none below: round 3 is asked for.
    expect(await decision.textContent()).toContain("Close to limit — more samples");
    expect(await page.getByTestId("decision-explanation").textContent()).toMatch(
      /^After round 2: 4 of 10 balls are close to the 135 s minimum, inside its 10 s guard band: .*Round 3 asks for 24 more samples\.$/,
    );
    expect(await page.getByTestId("ball-row").count()).toBe(DEMO_BALLS.length);
    expect(await page.getByText("outlier?").count()).toBeGreaterThanOrEqual(1);

    const dots = page.getByRole("figure", { name: "Drop times per ball" });
    await expect.poll(() => dots.locator("svg .recharts-scatter-symbol").count(), { timeout: 15_000 }).toBe(DEMO_BALLS.length * 3);
    const dist = page.getByRole("figure", { name: /Distribution of ball means/ });
    await expect.poll(() => dist.locator("svg .recharts-scatter-symbol").count()).toBe(DEMO_BALLS.length);
    expect(await dist.locator("svg .recharts-line-curve").count()).toBe(1);
    expect(await dist.getByText(/Lower tolerance limit \d+\.\d\d s/).count()).toBeGreaterThanOrEqual(1);
    // The table views carry the same numbers as the plots.
    expect(await dots.locator("table tbody tr").count()).toBe(DEMO_BALLS.length * 3);
    expect(await page.getByText("The governing specification and the testing laboratory").count()).toBeGreaterThanOrEqual(1);
    await screenshot(page, "results-demo-submission");
  }, 120_000);
});
