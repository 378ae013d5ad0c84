// Loads ffmpeg.wasm from the app's own origin (never a CDN), once per page. The bundlers cannot
// bundle @ffmpeg/ffmpeg, so its ESM files are served from public/ffmpeg and imported at run time.
import type { FFmpeg } from "@ffmpeg/ffmpeg";

let loading: Promise<FFmpeg> | null = null;

export function loadFfmpeg(): Promise<FFmpeg> {
  loading ??= (async () => {
    // `as string` keeps TypeScript from resolving the served path; the types are the package's own.
    const mod: typeof import("@ffmpeg/ffmpeg") = await import(/* webpackIgnore: true */ /* turbopackIgnore: true */ "/ffmpeg/esm/index.js" as string);
    const ffmpeg = new mod.FFmpeg();
    const base = `${location.origin}/ffmpeg/core`;
    await ffmpeg.load({ coreURL: `${base}/ffmpeg-core.js`, wasmURL: `${base}/ffmpeg-core.wasm` });
    return ffmpeg;
  })().catch((e: unknown) => {
    loading = null; // a failed load (offline, say) may be tried again
    throw e;
  });
  return loading;
}
