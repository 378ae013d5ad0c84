import "server-only";
import path from "node:path";
import { execTool } from "./exec";

async function ffmpeg(args: string[]): Promise<void> {
  const r = await execTool("ffmpeg", ["-hide_banner", "-v", "error", "-y", ...args], { timeoutMs: 300_000 });
  if (r.code !== 0) throw new Error(`ffmpeg: ${r.stderr.trim().split("\n").pop() ?? r.code}`);
}

/** One frame as a JPEG, by seeking (fast on any length of clip). */
export async function grabFrame(input: string, atSeconds: number, output: string, width: number): Promise<void> {
  await ffmpeg(["-ss", atSeconds.toFixed(3), "-i", input, "-frames:v", "1", "-vf", `scale=${width}:-2`, "-q:v", "4", output]);
}

/** A poster and a filmstrip of `tiles` frames spread over the clip, each from its own seek. */
export async function renderThumbnails(input: string, durationS: number, dir: string, tiles = 10): Promise<{ poster: string; filmstrip: string }> {
  const poster = path.join(dir, "poster.jpg");
  await grabFrame(input, durationS * 0.1, poster, 640);
  for (let i = 0; i < tiles; i++) await grabFrame(input, (durationS * (i + 0.5)) / tiles, path.join(dir, `tile-${String(i).padStart(2, "0")}.jpg`), 160);
  const filmstrip = path.join(dir, "filmstrip.jpg");
  await ffmpeg(["-framerate", "1", "-i", path.join(dir, "tile-%02d.jpg"), "-vf", `tile=${tiles}x1`, "-frames:v", "1", "-q:v", "5", filmstrip]);
  return { poster, filmstrip };
}
