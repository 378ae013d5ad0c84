// Reads, with ffprobe in the browser, the timestamps of the video packets around the end of a
// trim, so the stream copy can be cut where no stray frame slips in (see copyEndFor).
import type { FFmpeg } from "@ffmpeg/ffmpeg";
import { parsePacketCsv, type PacketTime } from "@/lib/uploads/trim/trim-rules";

const AROUND_S = 5;

// ffprobe in ffmpeg.wasm 0.12 answers -1 even when it worked, so its output is what counts.
async function probeText(ffmpeg: FFmpeg, args: string[], out: string): Promise<string> {
  await ffmpeg.ffprobe([...args, "-o", out]);
  const text = await ffmpeg.readFile(out, "utf8").catch(() => "");
  await ffmpeg.deleteFile(out).catch(() => undefined);
  if (!String(text).trim()) throw new Error("ffprobe could not read the file's timestamps.");
  return String(text);
}

/** The original's start time (seconds), the zero of every time the trim panel shows. */
export async function startTimeOf(ffmpeg: FFmpeg, input: string): Promise<number> {
  return Number((await probeText(ffmpeg, ["-v", "error", "-show_entries", "format=start_time", "-of", "csv=p=0", input], "/probe-start.txt")).trim()) || 0;
}

export async function packetsAround(ffmpeg: FFmpeg, input: string, end: number, start: number): Promise<PacketTime[]> {
  const from = Math.max(0, start + end - AROUND_S);
  const csv = await probeText(
    ffmpeg,
    [
      "-v",
      "error",
      "-select_streams",
      "v:0",
      "-read_intervals",
      `${from.toFixed(3)}%${(start + end + AROUND_S).toFixed(3)}`,
      "-show_entries",
      "packet=pts_time,dts_time",
      "-of",
      "csv=p=0",
      input,
    ],
    "/probe-packets.csv",
  );
  return parsePacketCsv(csv, start);
}
