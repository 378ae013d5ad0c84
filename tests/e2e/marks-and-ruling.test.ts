import { mkdtempSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb } from "@/lib/db";
import type { DropView } from "@/lib/readings/view";
import { renderSyntheticClip } from "@/scripts/clips/synth-clip";
import { signedIn, type Client } from "../helpers/app";
import { APP_URL, launch, screenshot, signInAs } from "../helpers/browser";
import { demo, makeUser } from "../helpers/fixtures";
import { json, placedDrops, read } from "../helpers/readings";

// A mark is saved only on a paused frame the player confirmed: during playback the mark keys and
// buttons save nothing and say why. And a ruling is chosen, never defaulted, and its missing
// reason is named before any confirmation is asked for.
let browser: Browser;
let readDropId: string;
let disputedId: string;
const START = 5;
const dir = mkdtempSync(path.join(process.env.TEST_TMP_DIR ?? os.tmpdir(), "wickmark-marks-"));

beforeAll(async () => {
  const tech = await signedIn(demo.email("technician"), demo.password);
  const r = await renderSyntheticClip({
    out: path.join(dir, "marks.mp4"),
    width: 320,
    height: 180,
    length: 6,
    drops: 1,
    durations: [2.2],
    fps: "25",
    start: 0.4,
    noise: 4,
  });
  const { dropIds } = await placedDrops(tech, { file: r.file, startFrame: START });
  expect(dropIds.length).toBeGreaterThanOrEqual(2);
  [readDropId, disputedId] = dropIds;
  // Two readings 2.4 s apart (the demo edition's tolerance is 0.5 s): a discrepancy for a lead.
  for (const clear of [40, 100]) {
    const u = await makeUser(["reviewer"]);
    await read(await signedIn(u.email, u.password), disputedId, 10, clear);
  }
  browser = await launch();
}, 120_000);
afterAll(async () => {
  await browser?.close();
  await closeDb();
});

const player = (page: Page) => page.getByTestId("frame-player");
const picture = (page: Page) => page.getByRole("group", { name: /^Picture of/ });

async function status(page: Page, want: string) {
  await expect.poll(() => player(page).getAttribute("data-status"), { timeout: 15_000 }).toBe(want);
}

/** Slows playback to a quarter (three presses of "[") and plays from the picture. */
async function playSlowly(page: Page) {
  await picture(page).focus();
  for (let i = 0; i < 3; i++) await page.keyboard.press("[");
  await page.keyboard.press(" ");
  await status(page, "playing");
}

/** Pauses from the picture; resolves to the frame the player confirmed once paused. */
async function pause(page: Page): Promise<number> {
  await picture(page).focus();
  await page.keyboard.press(" ");
  await status(page, "confirmed");
  return Number(await player(page).getAttribute("data-frame"));
}

async function openAs(roles: ("reviewer" | "lead")[], url: string): Promise<{ page: Page; client: Client; dialogs: string[] }> {
  const u = await makeUser(roles);
  const page = await (await browser.newContext({ viewport: { width: 1280, height: 900 } })).newPage();
  const dialogs: string[] = [];
  page.on("dialog", (d) => (dialogs.push(d.message()), void d.accept()));
  await signInAs(page, u.email, u.password);
  await page.waitForURL(`${APP_URL}/overview`);
  await page.goto(url);
  return { page, client: await signedIn(u.email, u.password), dialogs };
}

describe("marks during playback", () => {
  it("D, E and the mark buttons save nothing while the clip plays, and say to pause; once paused, D marks the frame", { timeout: 120_000 }, async () => {
    const { page, client } = await openAs(["reviewer"], `${APP_URL}/drops/${readDropId}`);
    await status(page, "confirmed");
    const said = page.getByTestId("mark-status");
    await playSlowly(page);

    await page.keyboard.press("d");
    await expect.poll(() => said.textContent()).toBe("Dispense not marked. Pause first: a mark is saved only on a paused frame the player has confirmed.");
    await page.keyboard.press("e");
    await expect.poll(() => said.textContent()).toMatch(/^Clear not marked\. Pause first/);
    // The buttons stay pressable while refused (aria-disabled), so a press can say why; Playwright
    // counts aria-disabled as disabled, hence force.
    const dispense = page.getByRole("button", { name: "Mark dispense (D)" });
    expect(await dispense.getAttribute("aria-disabled")).toBe("true");
    expect(await dispense.getAttribute("title")).toMatch(/^Pause first/);
    await page.getByRole("button", { name: "Mark clear (E)" }).click({ force: true });
    await dispense.click({ force: true });
    await expect.poll(() => said.textContent()).toMatch(/^Dispense not marked\. Pause first/);
    expect(await player(page).getAttribute("data-status")).toBe("playing");
    await screenshot(page, "marks-refused-while-playing");
    const drop = (await json<{ drop: DropView }>(await client.get(`/api/drops/${readDropId}`), 200)).drop;
    expect(drop.myDraft).toBeNull();

    const frame = await pause(page);
    expect(await dispense.getAttribute("aria-disabled")).toBe("false");
    await page.keyboard.press("d");
    await expect.poll(() => page.getByTestId("mark-panel").textContent(), { timeout: 10_000 }).toContain(`frame ${frame}`);
    expect(await said.textContent()).toBe("");
    await screenshot(page, "marks-after-pause");
  });
});

describe("the ruling form", () => {
  it("starts with no choice, names the missing choice and reason before asking to confirm, and refuses third marks during playback", {
    timeout: 120_000,
  }, async () => {
    const { page, dialogs } = await openAs(["lead"], `${APP_URL}/drops/${disputedId}/ruling`);
    const form = page.getByRole("region", { name: "Ruling" });
    const record = form.getByRole("button", { name: "Record the ruling" });
    await record.waitFor();
    for (const label of ["Accept the first reading", "Accept the second reading", /^Make a third reading/])
      expect(await form.getByLabel(label).isChecked()).toBe(false);

    await record.click();
    await form.getByText("Choose the first reading, the second, or a third reading of your own.").waitFor();
    await form.getByText("Reason is required.").waitFor();
    await screenshot(page, "ruling-nothing-chosen");
    await form.getByLabel("Accept the second reading").check();
    await form.getByLabel("Reason for the ruling").fill("too short");
    await record.click();
    await form.getByText("Write the reason for the ruling in a sentence (at least 10 characters).").waitFor();
    expect(await form.getByText("Choose the first reading").count()).toBe(0);
    expect(dialogs).toEqual([]);

    // A third reading: its marks refuse during playback too, and a missing one is named before confirming.
    await form.getByLabel(/^Make a third reading/).check();
    await form.getByLabel("Reason for the ruling").fill("Both readers' clear frames miss where the film has gone.");
    await status(page, "confirmed");
    await playSlowly(page);
    await page.keyboard.press("d");
    await expect.poll(() => page.getByTestId("mark-status").textContent()).toMatch(/^Third reading's dispense not marked\. Pause first/);
    expect(await page.getByTestId("third-marks").textContent()).toContain("dispense not marked");
    const frame = await pause(page);
    await page.keyboard.press("d");
    await expect.poll(() => page.getByTestId("third-marks").textContent()).toContain(`dispense ${frame},`);
    await record.click();
    await form.getByText("Mark the clear frame of the third reading.").waitFor();
    expect(dialogs).toEqual([]);
    await screenshot(page, "ruling-third-missing-clear");

    await form.getByLabel("Accept the second reading").check();
    await record.click();
    await form.getByText(/Ruled by .*the second reading, 3\.600 s/).waitFor();
    expect(dialogs).toEqual(["Record this ruling? It stands once made, and the two readings stay on record."]);
  });
});
