import { mkdtempSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb } from "@/lib/db";
import { renderSyntheticClip, type Truth } from "@/scripts/clips/synth-clip";
import { signedIn } from "../helpers/app";
import { APP_URL, launch, screenshot, signInAs } from "../helpers/browser";
import { demo, makeUser } from "../helpers/fixtures";
import { placedDrops } from "../helpers/readings";

// Two reviewers read the same drop in the browser, from the keyboard, as they would at the bench:
// go to the dispense frame, mark it, go to the clear frame, mark it, submit. The time shown must be
// the clip's own pts difference for those frames, and the second reading settles the drop.
let browser: Browser;
let truth: Truth;
let dropId: string;
const dir = mkdtempSync(path.join(process.env.TEST_TMP_DIR ?? os.tmpdir(), "wickmark-reading-"));

beforeAll(async () => {
  const tech = await signedIn(demo.email("technician"), demo.password);
  const r = await renderSyntheticClip({
    out: path.join(dir, "reading.mp4"),
    width: 320,
    height: 180,
    length: 6,
    drops: 1,
    durations: [2.2],
    fps: "25",
    start: 1.2,
    noise: 4,
  });
  truth = r.truth;
  dropId = (await placedDrops(tech, { file: r.file, startFrame: Math.max(0, truth.drops[0].dispenseFrame - 10) })).dropIds[0];
  browser = await launch();
}, 120_000);
afterAll(async () => {
  await browser?.close();
  await closeDb();
});

async function settled(page: Page, frame: number) {
  const player = page.getByTestId("frame-player");
  await expect
    .poll(async () => [await player.getAttribute("data-status"), await player.getAttribute("data-frame")], { timeout: 15_000 })
    .toEqual(["confirmed", String(frame)]);
}

/** G opens the go-to field; the picture takes the focus back so the mark keys reach the player. */
async function goTo(page: Page, frame: number) {
  await page.getByRole("group", { name: /^Picture of/ }).focus();
  await page.keyboard.press("g");
  await page.keyboard.press("Control+A");
  await page.keyboard.type(String(frame));
  await page.keyboard.press("Enter");
  await settled(page, frame);
  await page.getByRole("group", { name: /^Picture of/ }).focus();
}

async function readInBrowser(name: string): Promise<Page> {
  const u = await makeUser(["reviewer"], { name });
  const page = await (await browser.newContext({ viewport: { width: 1280, height: 800 } })).newPage();
  page.on("dialog", (d) => void d.accept());
  await signInAs(page, u.email, u.password);
  await page.waitForURL(`${APP_URL}/overview`);
  await page.goto(`${APP_URL}/drops/${dropId}`);
  await settled(page, Math.max(0, truth.drops[0].dispenseFrame - 10));
  const panel = page.getByTestId("mark-panel");
  await goTo(page, truth.drops[0].dispenseFrame);
  await page.keyboard.press("d");
  await expect.poll(() => panel.textContent(), { timeout: 10_000 }).toContain(`frame ${truth.drops[0].dispenseFrame}`);
  await goTo(page, truth.drops[0].clearFrame);
  await page.keyboard.press("e");
  await expect.poll(() => page.getByTestId("draft-time").textContent(), { timeout: 10_000 }).toContain(`${truth.drops[0].frameDuration.toFixed(3)} s`);
  return page;
}

describe("reading a drop in the browser", () => {
  it("the first reviewer marks and submits blind; the second settles the drop as agreed", { timeout: 180_000 }, async () => {
    const t = truth.drops[0];
    const first = await readInBrowser("Browser Reader One");
    await screenshot(first, "reading-first-draft");
    await first.getByRole("button", { name: "Submit reading" }).click();
    await first.getByText(`Your reading is submitted: ${t.frameDuration.toFixed(3)} s`).waitFor();
    await expect(first.getByText(/Blind reading/).count()).resolves.toBe(1);

    const second = await readInBrowser("Browser Reader Two");
    // Blind: nothing of the first reading on the second reader's page.
    expect(await second.content()).not.toContain("Browser Reader One");
    await second.getByRole("button", { name: "Submit reading" }).click();
    await second.getByText(/Agreed drop time/).waitFor();
    await second.locator("#readings-heading").waitFor();
    expect(await second.content()).toContain("Browser Reader One");
    await expect(second.getByText(`Agreed drop time ${t.frameDuration.toFixed(3)} s`, { exact: false }).count()).resolves.toBe(1);
    await screenshot(second, "reading-agreed");
  });
});
