// Serves ffmpeg.wasm from the app itself (no CDN): copies the ESM build of @ffmpeg/ffmpeg and
// @ffmpeg/util and the single-thread core into public/ffmpeg/. Run on install and before a build.
import { cpSync, existsSync, mkdirSync } from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "..");
const out = path.join(root, "public", "ffmpeg");
const from = (pkg, sub) => path.join(root, "node_modules", "@ffmpeg", pkg, "dist", sub);

if (!existsSync(from("ffmpeg", "esm"))) {
  console.warn("copy-ffmpeg: @ffmpeg/ffmpeg is not installed; skipping");
  process.exit(0);
}
mkdirSync(out, { recursive: true });
// Only the JavaScript: the packages' .d.ts files would otherwise join the app's type check.
const jsOnly = { recursive: true, filter: (src) => !src.endsWith(".d.ts") && !src.endsWith(".d.mts") };
cpSync(from("ffmpeg", "esm"), path.join(out, "esm"), jsOnly);
cpSync(from("util", "esm"), path.join(out, "util"), jsOnly);
for (const f of ["ffmpeg-core.js", "ffmpeg-core.wasm"]) cpSync(path.join(from("core", "esm"), f), path.join(out, "core", f));
console.log("copy-ffmpeg: public/ffmpeg is ready");
