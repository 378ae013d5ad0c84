import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb } from "@/lib/db";
import type { DropView } from "@/lib/readings/view";
import { signedIn } from "../helpers/app";
import { APP_URL, launch, screenshot, signInAs } from "../helpers/browser";
import { demo, makeUser } from "../helpers/fixtures";
import { plainMp4 } from "../helpers/media";
import { placedDrops, read } from "../helpers/readings";

// A lead looks at how the reviewers agree: the Bland–Altman plot draws a point per drop read twice,
// and its table view lists the same drops with their numbers.
let browser: Browser;
const settled: DropView[] = [];

beforeAll(async () => {
  browser = await launch();
  const tech = await signedIn(demo.email("technician"), demo.password);
  const [ua, ub] = [await makeUser(["reviewer"], { name: "Plot Reader Hazel" }), await makeUser(["reviewer"], { name: "Plot Reader Rowan" })];
  const [a, b] = [await signedIn(ua.email, ua.password), await signedIn(ub.email, ub.password)];
  const { dropIds } = await placedDrops(tech, { file: plainMp4(undefined, 4) });
  // Second readings 1, 4 and 30 frames longer: two agree, one is a discrepancy.
  for (const [i, extra] of [
    [0, 1],
    [1, 4],
    [2, 30],
  ] as const) {
    await read(a, dropIds[i], 2, 40);
    settled.push(await read(b, dropIds[i], 2, 40 + extra));
  }
}, 120_000);
afterAll(async () => {
  await browser?.close();
  await closeDb();
});

describe("reviewer agreement page", () => {
  it("draws the Bland–Altman plot with its points and lines, and lists the numbers as a table", async () => {
    const page = await (await browser.newContext({ viewport: { width: 1280, height: 900 } })).newPage();
    await signInAs(page, demo.email("lead"), demo.password);
    await page.waitForURL(`${APP_URL}/overview`);
    await page.getByRole("link", { name: "Reviewer agreement" }).click();
    await page.waitForURL(`${APP_URL}/agreement`);
    await page.getByRole("heading", { name: "Reviewer agreement" }).waitFor();

    const chart = page.getByRole("img", { name: /Differences between the two readings/ });
    await chart.locator("svg .recharts-symbols").first().waitFor();
    const n = Number((await page.locator("dt", { hasText: "Drops read twice" }).locator("xpath=../dd").textContent())!.trim());
    expect(n).toBeGreaterThanOrEqual(3);
    expect(await chart.locator("svg .recharts-symbols").count()).toBe(n);
    const svgText = (await chart.locator("svg").textContent())!;
    for (const line of ["Bias", "Upper limit", "Lower limit", "Mean of the two readings (s)", "First − second (s)"]) expect(svgText).toContain(line);
    await expect.poll(() => page.getByText(/Limits of agreement/).count()).toBeGreaterThan(0);
    await screenshot(page, "agreement");

    await page.getByText("Show the numbers as a table").click();
    const table = page.getByRole("table", { name: /Each drop's mean of the two readings/ });
    expect(await table.locator("tbody tr").count()).toBe(n);
    for (const d of settled) {
      const row = table.locator("tbody tr", { hasText: `${d.submissionReference} · ${d.sampleSerial} · drop ${d.ordinal}` });
      expect(await row.count()).toBe(1);
      const [first, second] = [...d.readings].sort((x, y) => x.slot! - y.slot!).map((r) => r.timeS!);
      // The table shows the numbers to the millisecond, with a true minus sign.
      expect(await row.locator("td").nth(2).textContent()).toBe((first - second).toFixed(3).replace("-", "−"));
    }
    await screenshot(page, "agreement-table");

    // The largest disagreement links to its drop.
    const top = page
      .getByRole("table", { name: /The drops whose readings differ most/ })
      .locator("tbody tr")
      .first()
      .getByRole("link");
    const href = (await top.getAttribute("href"))!;
    expect(href).toMatch(/^\/drops\/[0-9a-f-]{36}$/);
    await top.click();
    await page.waitForURL(`${APP_URL}${href}`);
  });

  it("says in words when the period is the wrong way round", async () => {
    const page = await (await browser.newContext({ viewport: { width: 1280, height: 900 } })).newPage();
    await signInAs(page, demo.email("lead"), demo.password);
    await page.waitForURL(`${APP_URL}/overview`);
    await page.goto(`${APP_URL}/agreement?from=2026-03-02&to=2026-03-01`);
    await page.getByText("The first day must not be after the last day.").first().waitFor();
  });
});
