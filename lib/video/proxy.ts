import { execTool } from "./exec";

export interface ProxyOptions {
  /** The time base denominator of the original, used as the proxy's timescale so times stay exact. */
  timescale: number;
  /** Frames between keyframes: about half a second at the clip's rate. */
  gop: number;
}

/**
 * The stepping proxy's ffmpeg arguments: H.264 without B-frames, a short fixed keyframe interval,
 * faststart, every frame passed through with its own timestamp, and the first frame at time 0.
 */
export function proxyArgs(input: string, output: string, o: ProxyOptions): string[] {
  const g = String(Math.max(1, o.gop));
  return [
    "-hide_banner",
    "-v",
    "error",
    "-y",
    "-i",
    input,
    "-map",
    "0:v:0",
    "-an",
    "-sn",
    "-dn",
    "-vf",
    "setpts=PTS-STARTPTS",
    "-fps_mode",
    "passthrough",
    "-c:v",
    "libx264",
    "-preset",
    "veryfast",
    "-crf",
    "18",
    "-pix_fmt",
    "yuv420p",
    "-bf",
    "0",
    "-g",
    g,
    "-keyint_min",
    g,
    "-sc_threshold",
    "0",
    "-video_track_timescale",
    String(o.timescale),
    "-movflags",
    "+faststart",
    output,
  ];
}

export async function buildProxy(input: string, output: string, o: ProxyOptions): Promise<void> {
  const r = await execTool("ffmpeg", proxyArgs(input, output, o), { timeoutMs: 6 * 3600_000 });
  if (r.code !== 0) throw new Error(`ffmpeg could not build the proxy: ${r.stderr.trim().split("\n").pop() ?? r.code}`);
}
