import { execTool } from "./exec";

/**
 * ffprobe's format and streams of a file or URL (a presigned GET: ffprobe reads only the byte
 * ranges it needs, so the object is streamed, never loaded whole).
 */
export async function probeMedia(input: string): Promise<{ ok: true; json: Record<string, unknown> } | { ok: false; stderr: string }> {
  const r = await execTool("ffprobe", ["-v", "error", "-print_format", "json", "-show_format", "-show_streams", input], { timeoutMs: 120_000 });
  if (r.code !== 0) return { ok: false, stderr: r.stderr || `ffprobe exited with ${r.code}` };
  try {
    const json = JSON.parse(r.stdout) as Record<string, unknown>;
    if (!json.format) return { ok: false, stderr: r.stderr || "Invalid data found when processing input" };
    return { ok: true, json };
  } catch {
    return { ok: false, stderr: "Invalid data found when processing input" };
  }
}
