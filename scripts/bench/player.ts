import { createReadStream, existsSync, mkdirSync, statSync, writeFileSync } from "node:fs";
import http from "node:http";
import type { AddressInfo } from "node:net";
import path from "node:path";
import { build } from "esbuild";
import { proxyGop } from "../../lib/clips/proxy-rules";
import { summarizeIndex } from "../../lib/frame-index/summary";
import { probePacketTimes } from "../../lib/frame-index/packets";
import { buildProxy } from "../../lib/video/proxy";
import { launch } from "../../tests/helpers/browser";
import { renderSyntheticClip } from "../clips/synth-clip";
import { projectRoot } from "../services/service";

// The player in headless Chromium on a 1080p stepping proxy: time from a key press (or a seek
// request) to the frame being confirmed on screen, measured inside the page.
const STEPS = 200;
const SEEKS = 200;

/** A static file server with byte ranges, which a <video> needs to seek. */
function serve(files: Record<string, { file: string; type: string }>): Promise<http.Server> {
  const server = http.createServer((req, res) => {
    const f = files[(req.url ?? "/").split("?")[0]];
    if (!f) return void res.writeHead(404).end();
    const size = statSync(f.file).size;
    const m = /^bytes=(\d+)-(\d*)$/.exec(req.headers.range ?? "");
    const start = m ? Number(m[1]) : 0;
    const end = m?.[2] ? Math.min(size - 1, Number(m[2])) : size - 1;
    res.writeHead(m ? 206 : 200, {
      "Content-Type": f.type,
      "Content-Length": end - start + 1,
      "Accept-Ranges": "bytes",
      ...(m ? { "Content-Range": `bytes ${start}-${end}/${size}` } : {}),
    });
    createReadStream(f.file, { start, end }).pipe(res);
  });
  return new Promise((resolve) => server.listen(0, "127.0.0.1", () => resolve(server)));
}

const quantile = (xs: number[], q: number) => {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.floor(q * s.length))];
};

export async function benchPlayer(opts: { seconds: number; width: number; height: number; gop?: number }) {
  const dir = path.join(projectRoot, ".data", "bench", "player");
  mkdirSync(dir, { recursive: true });
  const clip = path.join(dir, `synthetic-${opts.seconds}s-${opts.width}x${opts.height}.mp4`);
  if (!existsSync(clip)) {
    console.log(`rendering a ${opts.seconds} s ${opts.width}×${opts.height} synthetic clip for the player…`);
    await renderSyntheticClip({ out: clip, length: opts.seconds, width: opts.width, height: opts.height, fps: "30", drops: 2, noise: 10 });
  }
  const packets = await probePacketTimes(clip);
  const pts = packets.pts.map(Number);
  const summary = summarizeIndex(pts, packets.timeBase, packets.keyframes);
  // The worker's keyframe interval unless another is asked for (to see what a shorter one buys).
  const gop = opts.gop ?? proxyGop(summary.averageRate);
  const proxy = clip.replace(/\.mp4$/, `-proxy-gop${gop}.mp4`);
  if (!existsSync(proxy)) await buildProxy(clip, proxy, { timescale: packets.timeBase.den, gop });
  writeFileSync(
    path.join(dir, "index.json"),
    JSON.stringify({ frames: { pts, timeBase: packets.timeBase, nominalRate: "30", keyframes: packets.keyframes }, offsetPts: pts[0] }),
  );
  await build({
    entryPoints: [path.join(projectRoot, "scripts", "bench", "player-page.tsx")],
    bundle: true,
    minify: true,
    outfile: path.join(dir, "app.js"),
    jsx: "automatic",
    alias: { "@": projectRoot },
    define: { "process.env.NODE_ENV": '"production"' },
    logLevel: "error",
  });
  writeFileSync(
    path.join(dir, "index.html"),
    `<!doctype html><meta charset="utf-8"><link rel="stylesheet" href="/app.css"><div id="root" style="width:1200px"></div><script src="/app.js"></script>`,
  );
  const server = await serve({
    "/": { file: path.join(dir, "index.html"), type: "text/html" },
    "/app.js": { file: path.join(dir, "app.js"), type: "text/javascript" },
    "/app.css": { file: path.join(dir, "app.css"), type: "text/css" },
    "/index.json": { file: path.join(dir, "index.json"), type: "application/json" },
    "/proxy.mp4": { file: proxy, type: "video/mp4" },
  });
  const browser = await launch();
  try {
    const page = await browser.newPage({ viewport: { width: 1280, height: 800 } });
    // tsx keeps function names with a helper the page does not have; measureInPage is sent as text.
    await page.addInitScript("window.__name = (f) => f");
    await page.goto(`http://127.0.0.1:${(server.address() as AddressInfo).port}/`);
    await page.waitForFunction(() => document.querySelector('[data-testid="frame-player"]')?.getAttribute("data-status") === "confirmed", null, {
      timeout: 60_000,
    });
    const times = pts.map((p) => ((p - pts[0]) * packets.timeBase.num) / packets.timeBase.den);
    const r = await page.evaluate(measureInPage, { steps: STEPS, seeks: SEEKS, times });
    const interval = 1000 / summary.averageRate;
    const ms = (x: number) => `${x.toFixed(1)} ms`;
    const line = (what: string, xs: number[]) =>
      `${what.padEnd(22)} median ${ms(quantile(xs, 0.5)).padStart(9)}   p95 ${ms(quantile(xs, 0.95)).padStart(9)}   (${xs.length})`;
    console.log(
      `\nplayer: ${opts.width}×${opts.height} proxy, ${pts.length} frames at ${summary.averageRate.toFixed(2)} fps, keyframe every ${gop} frames; frame interval ${ms(interval)}`,
    );
    console.log(line("one-frame step", [...r.forward, ...r.back]));
    console.log(line("  forward", r.forward));
    console.log(line("  back", r.back));
    console.log(line("random seek", r.seeks));
    console.log(line("bare <video> step", r.bareSteps));
    console.log(line("bare <video> seek", r.bareSeeks));
    console.log(`frames not confirmed: ${r.unconfirmed}`);
    const med = quantile([...r.forward, ...r.back], 0.5);
    console.log(
      `player ÷ bare element, medians: step ${(med / quantile(r.bareSteps, 0.5)).toFixed(2)}×, seek ${(quantile(r.seeks, 0.5) / quantile(r.bareSeeks, 0.5)).toFixed(2)}×`,
    );
    console.log(`median step ≤ one frame interval (${ms(interval)}): ${med <= interval ? "met" : "NOT met"}`);
  } finally {
    await browser.close();
    server.close();
  }
}

/**
 * Runs in the page: every move of the player waits for its confirmed frame, timed with
 * performance.now(). Each move is followed by the same move on a bare <video> of the same file
 * (seek to mid-frame, wait for seeked and the painted frame), so a busy machine slows both alike.
 */
async function measureInPage(o: { steps: number; seeks: number; times: number[] }) {
  const root = document.querySelector<HTMLElement>('[data-testid="frame-player"]')!;
  const surface = root.querySelector<HTMLElement>('[role="group"][tabindex="0"]')!;
  const n = o.times.length;
  const mid = (i: number) => o.times[i] + ((i < n - 1 ? o.times[i + 1] : o.times[i]) - (i < n - 1 ? o.times[i] : o.times[i - 1])) / 2;
  const bare = document.createElement("video");
  bare.muted = true;
  bare.preload = "auto";
  bare.src = "/proxy.mp4";
  bare.style.cssText = "position:fixed;right:0;bottom:0;width:320px";
  document.body.appendChild(bare);
  await new Promise((r) => bare.addEventListener("loadeddata", r, { once: true }));
  const bareSeek = (i: number) =>
    new Promise<void>((resolve) => {
      let seeked = false;
      let painted = false;
      const done = () => seeked && painted && resolve();
      bare.requestVideoFrameCallback(() => {
        painted = true;
        done();
      });
      bare.addEventListener(
        "seeked",
        () => {
          seeked = true;
          done();
        },
        { once: true },
      );
      bare.currentTime = mid(i);
    });
  surface.focus();
  let unconfirmed = 0;
  const settled = (target: number) =>
    new Promise<void>((resolve) => {
      const done = () => {
        const { status, frame, target: asked } = root.dataset;
        if (asked !== String(target)) return false;
        if (status === "unconfirmed") unconfirmed++;
        return (status === "confirmed" && frame === String(target)) || status === "unconfirmed";
      };
      if (done()) return resolve();
      const obs = new MutationObserver(() => done() && (obs.disconnect(), resolve()));
      obs.observe(root, { attributes: true, attributeFilter: ["data-status", "data-frame", "data-target"] });
    });
  const timed = async (act: () => unknown) => {
    const t0 = performance.now();
    await act();
    return performance.now() - t0;
  };
  const key = (k: string, target: number) => () => (surface.dispatchEvent(new KeyboardEvent("keydown", { key: k, bubbles: true })), settled(target));
  const start = 300;
  window.player!.goToFrame(start);
  await settled(start);
  await bareSeek(start);
  const forward: number[] = [];
  const back: number[] = [];
  const bareSteps: number[] = [];
  for (let i = 1; i <= o.steps / 2; i++) {
    forward.push(await timed(key("ArrowRight", start + i)));
    bareSteps.push(await timed(() => bareSeek(start + i)));
  }
  for (let i = o.steps / 2 - 1; i >= 0; i--) {
    back.push(await timed(key("ArrowLeft", start + i)));
    bareSteps.push(await timed(() => bareSeek(start + i)));
  }
  let a = 7;
  const random = () => {
    a = (a * 1103515245 + 12345) % 2 ** 31;
    return a / 2 ** 31;
  };
  const seeks: number[] = [];
  const bareSeeks: number[] = [];
  for (let i = 0; i < o.seeks; i++) {
    const f = Math.floor(random() * n);
    if (f === Number(root.dataset.frame)) continue;
    seeks.push(await timed(() => (window.player!.goToFrame(f), settled(f))));
    bareSeeks.push(await timed(() => bareSeek(f)));
  }
  return { forward, back, seeks, bareSteps, bareSeeks, unconfirmed };
}
