import type { Browser, BrowserContext, Locator, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { ClipView } from "@/lib/clips/view";
import { closeDb } from "@/lib/db";
import type { DropView } from "@/lib/readings/view";
import { signedIn, type Client } from "../helpers/app";
import { APP_URL, launch, screenshot, signInAs } from "../helpers/browser";
import { uploadFile, waitForClip } from "../helpers/clips";
import { demo, demoOrganisationId, makeUser } from "../helpers/fixtures";
import { newRun, newSample, newSubmission } from "../helpers/intake";
import { plainMp4 } from "../helpers/media";
import { json, mark, read } from "../helpers/readings";

// Drops placed on a recording in the browser, then found by a reviewer in the reading queue and,
// once two readings disagree, by a lead among the discrepancies.
let browser: Browser;
let tech: Client;
let runId = "";
let serial = "";
let reference = "";
let clip: ClipView;
const contexts: BrowserContext[] = [];

beforeAll(async () => {
  browser = await launch();
  tech = await signedIn(demo.email("technician"), demo.password);
  const submission = await newSubmission(tech, await demoOrganisationId());
  reference = submission.reference;
  const sample = await newSample(tech, submission.id);
  serial = sample.serial;
  runId = (await newRun(tech, sample.id)).id;
  clip = await waitForClip(tech, (await uploadFile(tech, runId, plainMp4())).clipId);
  expect(clip.status, clip.rejectReason ?? "").toBe("ready");
}, 120_000);
afterAll(async () => {
  for (const c of contexts) await c.close();
  await browser?.close();
  await closeDb();
});

async function pageAs(email: string, password = demo.password): Promise<Page> {
  const context = await browser.newContext({ viewport: { width: 1280, height: 800 } });
  contexts.push(context);
  const page = await context.newPage();
  await signInAs(page, email, password);
  await page.waitForURL(`${APP_URL}/overview`);
  return page;
}

const dropsOnPage = (page: Page) => page.getByRole("region", { name: "Drops" });
const dropRow = (page: Page, n: number): Locator =>
  dropsOnPage(page)
    .getByRole("row")
    .filter({ has: page.getByRole("rowheader", { name: `Drop ${n}`, exact: true }) });
const runDrops = async () => (await json<{ drops: DropView[] }>(await tech.get(`/api/runs/${runId}/drops`), 200)).drops;

describe("drops in the browser: placed on a recording, queued for reviewers, listed for leads", () => {
  it("a technician places drops 1 and 2 on the run's only ready recording", async () => {
    const page = await pageAs(demo.email("technician"));
    await page.goto(`${APP_URL}/runs/${runId}`);
    const first = dropRow(page, 1);
    await first.getByText("not placed").waitFor();
    // The only ready recording is chosen already; the frame hint comes from its index.
    expect(await first.getByLabel("Recording", { exact: true }).inputValue()).toBe(clip.id);
    const last = clip.index!.frameCount - 1;
    await first.getByText(`This recording has frames 0 to ${last}.`).waitFor();

    await first.getByLabel("Start frame", { exact: true }).fill(String(last + 1));
    await first.getByRole("button", { name: "Save drop 1" }).click();
    await first.getByText(`The clip has frames 0 to ${last}; frame ${last + 1} is past its end.`).waitFor();
    expect(await first.getByLabel("Start frame", { exact: true }).inputValue()).toBe(String(last + 1));
    await screenshot(page, "drops-frame-refused");

    await first.getByLabel("Start frame", { exact: true }).fill("5");
    await first.getByRole("button", { name: "Save drop 1" }).click();
    await first.getByText("Saved.").waitFor();
    const second = dropRow(page, 2);
    await second.getByLabel("Start frame", { exact: true }).fill("20");
    await second.getByRole("button", { name: "Save drop 2" }).click();
    await second.getByText("Saved.").waitFor();

    for (const [row, frame] of [
      [first, "5"],
      [second, "20"],
    ] as const) {
      await row.getByRole("link", { name: clip.originalName }).waitFor();
      await row.getByRole("cell", { name: frame, exact: true }).waitFor();
    }
    await dropRow(page, 3).getByText("not placed").waitFor();
    await screenshot(page, "drops-placed");
    const drops = await runDrops();
    expect(drops.map((d) => [d.ordinal, d.clip?.id ?? null, d.startFrame])).toEqual([
      [1, clip.id, 5],
      [2, clip.id, 20],
      [3, null, null],
    ]);
  });

  it("a reviewer sees only their own progress on the run, finds the drops in the queue, and follows the link", async () => {
    const page = await pageAs(demo.email("reviewer"));
    await page.getByRole("link", { name: /^(\d+ drops?|No drops) waiting for your reading$/ }).waitFor();
    await screenshot(page, "overview-reviewer");
    await page.goto(`${APP_URL}/runs/${runId}`);
    await dropRow(page, 1).getByText("waiting for your reading").waitFor();
    await dropRow(page, 3).getByText("not ready to read").waitFor();
    expect(await dropsOnPage(page).getByRole("button").count()).toBe(0);
    expect(await dropRow(page, 3).getByRole("link", { name: "Read drop 3" }).count()).toBe(0);
    const [d1, d2] = await runDrops();
    expect(await dropRow(page, 2).getByRole("link", { name: "Read drop 2" }).getAttribute("href")).toBe(`/drops/${d2.id}`);
    await screenshot(page, "drops-reviewer-run");

    await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Reading queue" }).click();
    await page.waitForURL(`${APP_URL}/queue`);
    const queue = page.getByRole("table", { name: /waiting for your reading/ });
    const ours = queue.getByRole("row").filter({ hasText: serial });
    await expect.poll(() => ours.count()).toBe(2);
    await ours.first().getByText(reference).waitFor();
    await ours.first().getByText("not started").waitFor();
    await screenshot(page, "queue");
    await ours.getByRole("link", { name: `Drop 1 of sample ${serial}` }).click();
    await page.waitForURL(`${APP_URL}/drops/${d1.id}`);
  });

  it("a draft keeps a drop where it is, and a lead finds a disagreement among the discrepancies", async () => {
    const [d1, d2] = await runDrops();
    const [a, b] = await Promise.all([makeUser(["reviewer"], { name: "Reader Quillon" }), makeUser(["reviewer"], { name: "Reader Brackwater" })]);
    const [ra, rb] = await Promise.all([signedIn(a.email, a.password), signedIn(b.email, b.password)]);
    // 25 fps: 0.28 s against 1.6 s, clear frames 33 apart, far past the demo edition's 0.5 s.
    await read(ra, d1.id, 5, 12);
    expect((await read(rb, d1.id, 5, 45)).state).toBe("discrepancy");
    await mark(ra, d2.id, { dispenseFrame: 21 });

    const page = await pageAs(demo.email("technician"));
    await page.goto(`${APP_URL}/runs/${runId}`);
    await dropRow(page, 1).getByText("discrepancy").waitFor();
    await dropRow(page, 1).getByText("Reading has begun, so the drop stays where it is.").waitFor();
    const second = dropRow(page, 2);
    await second.getByLabel("Start frame", { exact: true }).fill("30");
    await second.getByRole("button", { name: "Save drop 2" }).click();
    await second.getByRole("alert").getByText("Reading of this drop has begun, so it stays where it is.").waitFor();
    expect(await second.getByLabel("Start frame", { exact: true }).inputValue()).toBe("30");
    await screenshot(page, "drops-move-refused");
    expect((await runDrops())[1].startFrame).toBe(20);

    const lead = await pageAs(demo.email("lead"));
    await lead.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Discrepancies" }).click();
    await lead.waitForURL(`${APP_URL}/discrepancies`);
    const row = lead
      .getByRole("table", { name: /readings disagree/ })
      .getByRole("row")
      .filter({ hasText: serial });
    await row.waitFor();
    for (const text of [reference, "0.28 s", "by Reader Quillon", "1.6 s", "by Reader Brackwater", "+1.32 s", "dispense 0 s · clear +1.32 s", "±0.5 s"]) {
      await row.getByText(text, { exact: true }).waitFor();
    }
    await screenshot(lead, "discrepancies");
    await row.getByRole("link", { name: `Drop 1 of sample ${serial}`, exact: true }).click();
    await lead.waitForURL(`${APP_URL}/drops/${d1.id}`);
  });
});
