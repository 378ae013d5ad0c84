import { mkdtempSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { ClipView } from "@/lib/clips/view";
import { closeDb, db } from "@/lib/db";
import { listOrganisations } from "@/lib/organisations/queries";
import { frameCodeGeometry, type FrameCodeGeometry } from "@/lib/video/frame-code";
import { renderSyntheticClip } from "@/scripts/clips/synth-clip";
import { rng } from "@/scripts/clips/synth-plan";
import { signedIn, type Client } from "../helpers/app";
import { APP_URL, launch, screenshot, signInAs } from "../helpers/browser";
import { CLIP_VARIANTS, variantFile } from "../helpers/clip-variants";
import { uploadFile, waitForClip } from "../helpers/clips";
import { demo } from "../helpers/fixtures";
import { newRun, newSample, newSubmission } from "../helpers/intake";

// Every frame the player says it shows must be the frame asked for, proven by the frame code
// burned into the picture itself, read from the pixels the browser put on the <video>.
const SINGLE_STEPS = 36;
const RANDOM_SEEKS = 200;
const dir = mkdtempSync(path.join(process.env.TEST_TMP_DIR ?? os.tmpdir(), "wickmark-frames-"));
let browser: Browser;
let page: Page;
let tech: Client;
const ready = new Map<string, Promise<ClipView>>();
const tally: string[] = [];

beforeAll(async () => {
  tech = await signedIn(demo.email("technician"), demo.password);
  const s = await newSubmission(tech, (await listOrganisations(db()))[0].id);
  const runId = (await newRun(tech, (await newSample(tech, s.id)).id)).id;
  // Render and upload one after another in the background: the worker processes the next clips
  // while the browser checks the first.
  let chain: Promise<unknown> = Promise.resolve();
  for (const [name, opts] of CLIP_VARIANTS) {
    const clip = chain.then(async () => {
      const { file } = await renderSyntheticClip({
        width: 320,
        height: 180,
        length: 3,
        drops: 1,
        noise: 4,
        ...opts,
        out: path.join(dir, variantFile(name, opts)),
      });
      return (await uploadFile(tech, runId, file)).clipId;
    });
    chain = clip.catch(() => undefined);
    const done = clip.then((id) => waitForClip(tech, id, 180_000));
    done.catch(() => undefined);
    ready.set(name, done);
  }
  browser = await launch();
  page = await (await browser.newContext({ viewport: { width: 1280, height: 800 } })).newPage();
  await signInAs(page, demo.email("reviewer"), demo.password);
  await page.waitForURL(`${APP_URL}/overview`);
}, 120_000);

afterAll(async () => {
  console.log(`[frame accuracy]\n${tally.join("\n")}`);
  await browser?.close();
  await closeDb();
});

interface Seen {
  status: string;
  frame: string;
  code: number;
}

/**
 * Waits until the player has settled on `target` (confirmed or not), then reads the frame code
 * from the <video>'s pixels as lib/video/frame-code.ts lays it out: each block's mean luma
 * against the threshold 128.
 */
function settleAndRead(p: Page, target: number, g: FrameCodeGeometry, videoId = "player-video"): Promise<Seen> {
  return p.evaluate(
    ({ target, g, videoId }) =>
      new Promise<Seen>((resolve, reject) => {
        const root = document.querySelector<HTMLElement>('[data-testid="frame-player"]')!;
        const video = document.querySelector<HTMLVideoElement>(`[data-testid="${videoId}"]`)!;
        const end = performance.now() + 10_000;
        const look = () => {
          const { status = "", frame = "", target: asked } = root.dataset;
          if (asked === String(target) && (status === "confirmed" || status === "unconfirmed")) {
            const canvas = document.createElement("canvas");
            canvas.width = video.videoWidth;
            canvas.height = video.videoHeight;
            const ctx = canvas.getContext("2d", { willReadFrequently: true })!;
            ctx.drawImage(video, 0, 0);
            const px = ctx.getImageData(g.x, g.y, g.count * g.block, g.block).data;
            const inset = Math.floor(g.block / 4);
            let code = 0;
            for (let i = 0; i < g.count; i++) {
              let sum = 0;
              let n = 0;
              for (let y = inset; y < g.block - inset; y++)
                for (let x = i * g.block + inset; x < (i + 1) * g.block - inset; x++) {
                  const o = (y * g.count * g.block + x) * 4;
                  sum += 0.299 * px[o] + 0.587 * px[o + 1] + 0.114 * px[o + 2];
                  n++;
                }
              if (sum / n >= 128) code += 2 ** i;
            }
            return resolve({ status, frame, code });
          }
          if (performance.now() > end) return reject(new Error(`player still ${status} at target ${asked} while waiting for frame ${target}`));
          requestAnimationFrame(look);
        };
        look();
      }),
    { target, g, videoId },
  );
}

describe("frame accuracy of the player in Chromium, for every kind of recording", () => {
  for (const [name] of CLIP_VARIANTS) {
    it(`${name}: each frame shown is the frame asked for, by the frame code in its pixels`, { timeout: 300_000 }, async () => {
      const clip = await ready.get(name)!;
      expect(clip.status, clip.rejectReason ?? "").toBe("ready");
      const frameCount = clip.index!.frameCount;
      await page.goto(`${APP_URL}/clips/${clip.id}`);
      const player = page.getByTestId("frame-player");
      await player.waitFor();
      const size = await page
        .getByTestId("player-video")
        .evaluate(
          (v: HTMLVideoElement) =>
            new Promise<[number, number]>((r) =>
              v.videoWidth ? r([v.videoWidth, v.videoHeight]) : v.addEventListener("loadedmetadata", () => r([v.videoWidth, v.videoHeight]), { once: true }),
            ),
        );
      const g = frameCodeGeometry(size[0], size[1]);
      const wrong: string[] = [];
      let checked = 0;
      const check = async (target: number, how: string) => {
        const seen = await settleAndRead(page, target, g);
        checked++;
        if (seen.status !== "confirmed" || seen.frame !== String(target) || seen.code !== target)
          wrong.push(`${how} → asked ${target}, player ${seen.status} ${seen.frame || "(none)"}, picture ${seen.code}`);
      };

      await check(0, "opening");
      await page.getByRole("group", { name: /^Picture of/ }).focus();
      // The go-to field from the keyboard: G to reach it, select what is there, type, Enter.
      const go = async (f: number, how: string) => {
        await page.keyboard.press("g");
        await page.keyboard.press("Control+A");
        await page.keyboard.type(String(f));
        await page.keyboard.press("Enter");
        await check(f, how);
      };
      // Single steps forward then back over the same stretch, across the proxy's keyframes (every ~0.5 s).
      const from = Math.floor(frameCount / 3);
      await go(from, "go to");
      for (let i = 1; i <= SINGLE_STEPS; i++) {
        await page.keyboard.press("ArrowRight");
        await check(from + i, "→");
      }
      for (let i = SINGLE_STEPS - 1; i >= -SINGLE_STEPS / 2; i--) {
        await page.keyboard.press("ArrowLeft");
        await check(from + i, "←");
      }
      // Seeded, so a failure can be replayed.
      const random = rng(20261201 + frameCount);
      for (let i = 0; i < RANDOM_SEEKS; i++) await go(Math.floor(random() * frameCount), `random seek ${i}`);
      await go(frameCount - 1, "last frame");
      await screenshot(page, `frame-accuracy-${name.replace(/\W+/g, "-").toLowerCase()}`);

      tally.push(`  ${name}: ${checked - wrong.length}/${checked} frames shown as asked (${frameCount} frames in the clip)`);
      expect(wrong).toEqual([]);
    });
  }
});

describe("the player's picture tools in Chromium", () => {
  it("compares a pinned reference frame with the frame on screen, zooms, and lists every key", { timeout: 120_000 }, async () => {
    const clip = await ready.get(CLIP_VARIANTS[0][0])!;
    await page.goto(`${APP_URL}/clips/${clip.id}`);
    const player = page.getByTestId("frame-player");
    await player.waitFor();
    const g = frameCodeGeometry(clip.index!.width, clip.index!.height);
    await settleAndRead(page, 0, g);
    await page.getByRole("group", { name: /^Picture of/ }).focus();
    for (let i = 0; i < 12; i++) await page.keyboard.press("ArrowRight");
    expect(await settleAndRead(page, 12, g)).toMatchObject({ status: "confirmed", frame: "12", code: 12 });
    await page.keyboard.press("r");
    await page.keyboard.press("Shift+ArrowRight");
    await page.keyboard.press("Shift+ArrowRight");
    await page.keyboard.press("c");
    await page.getByText("Reference: frame 12 (picked by you)").first().waitFor();
    await page.getByText("Finding the reference frame…").waitFor({ state: "hidden" });
    expect(await settleAndRead(page, 32, g)).toMatchObject({ status: "confirmed", frame: "32", code: 32 });
    expect((await settleAndRead(page, 32, g, "compare-video")).code).toBe(12);
    await screenshot(page, "player-compare");

    await page.keyboard.press("c");
    await page.keyboard.press("c");
    for (let i = 0; i < 4; i++) await page.keyboard.press("+");
    await page.getByText("Picture: zoom, brightness, contrast, compare").click();
    await expect.poll(() => page.getByRole("slider", { name: "Zoom" }).inputValue()).toBe("4");
    // Zoom and tone are drawn by the browser: the frame itself, read from the <video>, is untouched.
    expect((await settleAndRead(page, 32, g)).code).toBe(32);
    await screenshot(page, "player-zoomed");

    await page.getByRole("group", { name: /^Picture of/ }).focus();
    await page.keyboard.press("?");
    const keys = page.getByRole("dialog", { name: "Player keys" });
    await keys.waitFor();
    for (const label of [
      "One frame back",
      "Ten frames forward",
      "One second forward (by the frames' own times)",
      "Play or pause",
      "Zoom in",
      "Make the frame on screen the reference frame",
    ])
      await keys.getByText(label, { exact: true }).waitFor();
    await screenshot(page, "player-key-map");
    await page.keyboard.press("Escape");
    await keys.waitFor({ state: "hidden" });
  });
});
