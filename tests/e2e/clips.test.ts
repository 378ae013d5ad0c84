import { execFileSync } from "node:child_process";
import { createHash } from "node:crypto";
import { createWriteStream, mkdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { pipeline } from "node:stream/promises";
import type { Browser, BrowserContext, Locator, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { clipObjectKey } from "@/lib/clips/object-keys";
import { formatBytes } from "@/lib/numbers";
import type { ClipView } from "@/lib/clips/view";
import { closeDb, db } from "@/lib/db";
import { listOrganisations } from "@/lib/organisations/queries";
import { getObjectStream } from "@/lib/storage";
import { readFrameCodes } from "@/lib/video/read-frame-codes";
import { signedIn, type Client } from "../helpers/app";
import { APP_URL, launch, screenshot, signInAs } from "../helpers/browser";
import { frameCodedMp4, sizedMp4 } from "../helpers/clip-media";
import { waitForClip } from "../helpers/clips";
import { demo } from "../helpers/fixtures";
import { newRun, newSample, newSubmission } from "../helpers/intake";

let browser: Browser;
let lead: Client;
let runUrl = "";
let runId = "";
const contexts: BrowserContext[] = [];
const DOWNLOADS = path.resolve(import.meta.dirname, "../../test-results/downloads");

beforeAll(async () => {
  browser = await launch();
  lead = await signedIn(demo.email("lead"), demo.password);
  const org = (await listOrganisations(db()))[0].id;
  const submission = await newSubmission(lead, org);
  runId = (await newRun(lead, (await newSample(lead, submission.id)).id)).id;
  runUrl = `${APP_URL}/runs/${runId}`;
});
afterAll(async () => {
  for (const c of contexts) await c.close();
  await browser?.close();
  await closeDb();
});

async function technicianOnRun(): Promise<{ page: Page; recordings: Locator }> {
  const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
  contexts.push(context);
  const page = await context.newPage();
  await signInAs(page, demo.email("technician"), demo.password);
  await page.waitForURL(`${APP_URL}/overview`);
  await page.goto(runUrl);
  const recordings = page.getByRole("region", { name: "Recordings" });
  await recordings.getByRole("heading", { name: "Upload recordings" }).waitFor();
  return { page, recordings };
}

async function clipNamed(name: string): Promise<ClipView> {
  const clips = (await (await lead.get(`/api/runs/${runId}/clips`)).json()).clips as ClipView[];
  const clip = clips.find((c) => c.originalName === name);
  if (!clip) throw new Error(`no clip named ${name} on the run: ${clips.map((c) => c.originalName).join(", ")}`);
  return clip;
}

/**
 * The ids of the uploads the page keeps in the browser to resume (IndexedDB "wickmark-uploads",
 * store "pending"). Called only once the page has opened that database itself.
 */
const storedUploads = (page: Page) =>
  page.evaluate(
    () =>
      new Promise<string[]>((resolve, reject) => {
        const req = indexedDB.open("wickmark-uploads");
        req.onerror = () => reject(req.error);
        req.onsuccess = () => {
          const idb = req.result;
          const keys = idb.transaction("pending", "readonly").objectStore("pending").getAllKeys();
          keys.onsuccess = () => {
            idb.close();
            resolve(keys.result.map(String));
          };
          keys.onerror = () => reject(keys.error);
        };
      }),
  );
const sha256 = (file: string) => createHash("sha256").update(readFileSync(file)).digest("hex");
const valueNow = async (bar: Locator) => Number(await bar.getAttribute("aria-valuenow"));

describe("recordings in the browser: upload, pause and resume across a reload, trim before upload", () => {
  it("a technician uploads a recording, watches the progress, and sees the clip become ready", async () => {
    const { file, size } = sizedMp4(12, `clips-e2e-upload-${Date.now()}.mp4`);
    const name = path.basename(file);
    const { page, recordings } = await technicianOnRun();
    // A slower link than loopback (24 Mbit/s up), so the bar can be seen moving.
    const cdp = await page.context().newCDPSession(page);
    await cdp.send("Network.enable");
    await cdp.send("Network.emulateNetworkConditions", { offline: false, latency: 5, downloadThroughput: -1, uploadThroughput: 3 * 1024 * 1024 });

    await recordings.getByLabel("Video files to upload").setInputFiles(file);
    const row = recordings.getByRole("article", { name: new RegExp(name.replace(/\./g, "\\.")) });
    await row.getByRole("button", { name: `Upload whole file ${name}` }).waitFor();
    await screenshot(page, "clips-picked");

    await row.getByRole("button", { name: `Upload whole file ${name}` }).click();
    const bar = row.getByRole("progressbar", { name: `Upload of ${name}` });
    await expect.poll(() => valueNow(bar), { timeout: 20_000, interval: 50 }).toBeGreaterThan(0);
    const early = await valueNow(bar);
    expect(early).toBeLessThan(100);
    expect(await bar.getAttribute("aria-valuetext")).toMatch(/^\d+ %, [\d.]+ (B|kB|MB) of [\d.]+ MB$/);
    await row.getByText(/MB\/s · .* left · \d of 3 parts stored/).waitFor();
    await screenshot(page, "clips-uploading");
    await expect.poll(() => valueNow(bar), { timeout: 20_000, interval: 50 }).toBeGreaterThan(early);
    // biome-ignore lint/performance/useDomNodeTextContent: Playwright's locator, not a DOM node: innerText is the text as shown
    const shown = (await row.getByText(/MB\/s/).innerText()).match(/([\d.]+ [kM]B\/s)/)?.[1];
    console.log(`[clips e2e] upload speed shown under a 3 MB/s link: ${shown}`);

    await row.getByText("Stored in full.").waitFor({ timeout: 30_000 });
    await row.getByRole("list", { name: `Processing steps of ${name}` }).waitFor();
    await screenshot(page, "clips-processing");
    await row.getByText("5 of 5 steps finished").waitFor({ timeout: 60_000 });

    await row.getByRole("link", { name: "Open the clip page" }).click();
    await page.waitForURL(/\/clips\/[0-9a-f-]{36}$/);
    await page.getByRole("heading", { name, level: 1 }).waitFor();
    await page.getByText("Ready", { exact: true }).waitFor();
    await page.getByText(sha256(file)).waitFor();
    // 12 MB at ≈1.9 MB/s is ≈6.3 s of 25 fps: the index says so in words.
    await page.getByText(/^\d+ frames, 25 fps average, constant rate, first timestamp 0 s, 1280×720, H\.264, B-frames: no\.$/).waitFor();
    await page.getByRole("img", { name: `Poster frame of ${name}` }).waitFor();
    await screenshot(page, "clips-ready");
    const clip = await clipNamed(name);
    expect(clip.storedSize).toBe(size);
    expect(clip.status).toBe("ready");
  });

  it("pauses after the first part, survives a reload, and resumes from the parts the server kept", async () => {
    const { file, size } = sizedMp4(16, `clips-e2e-resume-${Date.now()}.mp4`);
    const name = path.basename(file);
    expect(Math.ceil(size / (5 * 1024 * 1024))).toBe(4);
    const { page, recordings } = await technicianOnRun();
    // Parts 2 and up wait at the storage door, so the pause lands after exactly one stored part.
    await page.route(/[?&]partNumber=([2-9]|\d\d+)(&|$)/, (route) => (route.request().method() === "PUT" ? undefined : route.continue()));

    await recordings.getByLabel("Video files to upload").setInputFiles(file);
    const row = recordings.getByRole("article", { name: new RegExp(name.replace(/\./g, "\\.")) });
    await row.getByRole("button", { name: `Upload whole file ${name}` }).click();
    await row.getByText("1 of 4 parts stored").waitFor({ timeout: 20_000 });
    await row.getByRole("button", { name: `Pause ${name}` }).click();
    // Pause waits for the parts in flight, which the route holds back: "Stop now" drops them, and says so first.
    await row.getByText(/^Pausing: finishing the 3 parts in flight/).waitFor();
    await screenshot(page, "clips-pausing");
    await row.getByRole("button", { name: /^Stop now: drop the 3 parts in flight \(.* sent\); Resume sends them again/ }).click();
    await row.getByText("Paused. 1 of 4 parts are stored on the server; Resume sends the rest.").waitFor();
    await screenshot(page, "clips-paused");
    const { id } = await clipNamed(name);
    const kept = await (await lead.get(`/api/clips/${id}/upload`)).json();
    expect(kept.parts.map((p: { partNumber: number }) => p.partNumber)).toEqual([1]);
    // The unfinished upload is kept in the browser, which is what a reload resumes from.
    expect(await storedUploads(page)).toContain(id);

    await page.unrouteAll({ behavior: "ignoreErrors" });
    await page.reload();
    const offers = recordings.getByRole("listitem").filter({ hasText: "1 of 4 parts stored" });
    await offers.getByRole("button", { name: `Resume upload of ${name}` }).waitFor();
    await screenshot(page, "clips-resume-offer");
    await offers.getByRole("button", { name: `Resume upload of ${name}` }).click();
    const resumed = recordings.getByRole("article", { name: new RegExp(name.replace(/\./g, "\\.")) });
    await resumed.getByText("Stored in full.").waitFor({ timeout: 30_000 });
    await screenshot(page, "clips-resumed");

    const clip = await waitForClip(lead, id);
    expect(clip.storedSize).toBe(size);
    expect(clip.sha256).toBe(sha256(file));
    expect(clip.status).toBe("ready");
    // Finished uploads are forgotten by the browser: its store no longer holds this one, and a reload offers nothing to resume.
    await page.reload();
    await recordings.getByRole("link", { name }).waitFor();
    expect(await storedUploads(page)).not.toContain(id);
    expect(await recordings.getByRole("button", { name: `Resume upload of ${name}` }).count()).toBe(0);
  });

  it("pausing finishes the parts in flight: what was sent stays stored and shown, and no new part starts", async () => {
    const { file, size } = sizedMp4(16, `clips-e2e-pause-${Date.now()}.mp4`);
    const name = path.basename(file);
    const { page, recordings } = await technicianOnRun();
    // The first three parts (all three lanes) wait at the storage door until the pause is pressed.
    let release: () => void = () => {};
    const gate = new Promise<void>((r) => (release = r));
    const started: number[] = [];
    await page.route(/[?&]partNumber=\d+(&|$)/, async (route) => {
      if (route.request().method() !== "PUT") return route.continue();
      started.push(Number(/partNumber=(\d+)/.exec(route.request().url())![1]));
      await gate;
      await route.continue();
    });
    await recordings.getByLabel("Video files to upload").setInputFiles(file);
    const row = recordings.getByRole("article", { name: new RegExp(name.replace(/\./g, "\\.")) });
    await row.getByRole("button", { name: `Upload whole file ${name}` }).click();
    await expect.poll(() => started.length, { timeout: 20_000 }).toBe(3);
    await row.getByText("Pause finishes the 3 parts in flight first and keeps every stored part; no new part is started until you resume.").waitFor();
    await row.getByRole("button", { name: `Pause ${name}` }).click();
    await row.getByText(/^Pausing: finishing the 3 parts in flight/).waitFor();
    release();
    await row.getByText("Paused. 3 of 4 parts are stored on the server; Resume sends the rest.").waitFor({ timeout: 30_000 });
    // The bar keeps what the three parts sent: 15 MB, not what was stored before they finished.
    await row.getByText(new RegExp(`^${formatBytes(15 * 1024 * 1024).replace(".", "\\.")} of ${formatBytes(size).replace(".", "\\.")}`)).waitFor();
    await screenshot(page, "clips-paused-in-flight-kept");
    expect(started.sort()).toEqual([1, 2, 3]);
    const { id } = await clipNamed(name);
    const kept = await (await lead.get(`/api/clips/${id}/upload`)).json();
    expect(kept.parts.map((p: { partNumber: number }) => p.partNumber).sort()).toEqual([1, 2, 3]);
    await row.getByRole("button", { name: `Resume ${name}` }).click();
    await row.getByText("Stored in full.").waitFor({ timeout: 30_000 });
    expect(started.sort()).toEqual([1, 2, 3, 4]);
  });

  it("trims in the browser to the chosen window, and the stored clip holds exactly those frames", async () => {
    const source = frameCodedMp4({ seconds: 10, fps: 25, gop: 25, name: `clips-e2e-coded-${Date.now()}.mp4` });
    const name = path.basename(source);
    // 3.5 s is between keyframes (one a second): the copy must start at 3 s and the clip still work.
    const trimmedName = name.replace(/\.mp4$/, "-trim-3.5-6.mp4");
    const { page, recordings } = await technicianOnRun();

    await recordings.getByLabel("Video files to upload").setInputFiles(source);
    const row = recordings.getByRole("article", { name: new RegExp(name.replace(/\./g, "\\.")) });
    await row.getByRole("button", { name: `Trim first ${name}` }).click();
    const panel = row.getByRole("group", { name: "Trim first" });
    await panel.getByText("The recording lasts 0:10.000.", { exact: false }).waitFor();
    await panel.getByText(/begins at the keyframe at or before the start/).waitFor();
    await panel.getByLabel("Start").fill("3.5");
    await panel.getByLabel("End").fill("0:06");
    await screenshot(page, "clips-trim-panel");
    await panel.getByRole("button", { name: "Trim and upload" }).click();

    const trimmed = recordings.getByRole("article", { name: new RegExp(trimmedName.replace(/\./g, "\\.")) });
    // The note says what was asked; the clip's page says what was really kept (checked below).
    await trimmed.getByText(`Trimmed in the browser from ${name}: asked for 3.5 s to 6 s.`, { exact: false }).waitFor({ timeout: 60_000 });
    await trimmed.getByText("Stored in full.").waitFor({ timeout: 30_000 });
    await screenshot(page, "clips-trimmed-uploaded");
    const clip = await waitForClip(lead, (await clipNamed(trimmedName)).id);
    expect(clip.status, JSON.stringify(clip.steps)).toBe("ready");

    mkdirSync(DOWNLOADS, { recursive: true });
    const stored = path.join(DOWNLOADS, trimmedName);
    await pipeline(await getObjectStream(clipObjectKey(clip.id, "original")), createWriteStream(stored));
    const codes = await readFrameCodes(stored);
    // Stream copy starts at the keyframe at or before 3.5 s: with one every 25 frames, frame 75.
    expect(codes[0]).toBe(75);
    codes.forEach((c, i) => expect(c, `frame ${i} of the trimmed clip`).toBe(75 + i));
    expect(Math.abs(codes[codes.length - 1] - 150)).toBeLessThanOrEqual(1);
    expect(clip.index?.frameCount).toBe(codes.length);
    // Kept frames in the original's seconds (the trim keeps the original's timestamps).
    expect(clip.trim).toMatchObject({
      sourceName: name,
      requestedStartS: 3.5,
      requestedEndS: 6,
      keptFirstS: codes[0] / 25,
      keptLastS: codes[codes.length - 1] / 25,
    });
    await page.goto(`${APP_URL}/clips/${clip.id}`);
    expect(clip.trim!.note).toMatch(/kept the frames shown from 3 s to .* It starts before the start asked for/);
    await page.getByText(clip.trim!.note).waitFor();
    await screenshot(page, "clips-trimmed-provenance");
  });

  it("refuses a raw H.264 stream in words, and the later steps read Not needed", async () => {
    const mp4 = frameCodedMp4({ seconds: 1, name: `clips-e2e-raw-${Date.now()}.mp4` });
    const raw = mp4.replace(/\.mp4$/, ".h264");
    execFileSync("ffmpeg", ["-v", "error", "-y", "-i", mp4, "-c", "copy", "-bsf:v", "h264_mp4toannexb", "-f", "h264", raw]);
    const name = path.basename(raw);
    const { page, recordings } = await technicianOnRun();
    await recordings.getByLabel("Video files to upload").setInputFiles(raw);
    const row = recordings.getByRole("article", { name: new RegExp(name.replace(/\./g, "\\.")) });
    await row.getByRole("button", { name: `Upload whole file ${name}` }).click();
    await row
      .getByText(/^This file is a raw H\.264 stream: .*no frame carries a time/)
      .first()
      .waitFor({ timeout: 30_000 });
    const steps = row.getByRole("list", { name: `Processing steps of ${name}` });
    expect(await steps.getByText("Not needed").count()).toBe(4);
    expect(await steps.getByText("Waiting").count()).toBe(0);
    await screenshot(page, "clips-raw-stream-refused");
  });
});
