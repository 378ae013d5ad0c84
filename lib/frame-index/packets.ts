import "server-only";
import { spawn } from "node:child_process";
import { decodablePackets, fillFrameTimes, parseProbeLine, type RawPacket, type Rational, toDisplayOrder } from "./packet-order";

// Per-frame timestamps without decoding: ffprobe's packet list is read in ~1 s for an hour of
// 1080p, where -show_frames would decode every frame (minutes). Packets come in decode order;
// toDisplayOrder sorts them. What the containers give (ffmpeg 5.1):
//   mp4  pts on every packet; B-frame delay hidden by an edit list (first pts 0 or the offset, dts < it).
//   mkv  pts in a 1 ms time base (rounded: 30000/1001 steps 33/34 ms); dts N/A on reordered packets.
//   ts   90 kHz; ffmpeg's muxer starts at 1.4 s, plus the B-frame delay, plus any offset.
//   mpeg program streams (.mpg, .vob): 90 kHz, but a pts only every few packets: decoded instead.
//   avi  no pts at all for H.264; MPEG-4 Part 2 has pts = dts, except N/A on the frames that
//        B-frames reorder. Every chunk owns one slot of the stream rate (empty chunks fill the
//        gaps of a variable rate), so the dts is the frame's time. Decoding does not help:
//        ffmpeg stamps decoded AVI frames with a later packet's dts (1 slot late with MPEG-4
//        B-frames, 2 with H.264) and leaves the last frame without a timestamp.

export interface PacketTimes {
  timeBase: Rational;
  /** The stream's start_pts (null when ffprobe reports N/A). */
  startPts: number | null;
  /** Every frame's timestamp in display order (integers in timeBase). */
  pts: number[];
  /** Display indices of key frames. */
  keyframes: number[];
  clock: "pts" | "dts";
}

/** Runs a tool and hands each stdout line to `onLine` as it arrives; rejects with stderr's tail on failure. */
function streamLines(cmd: string, args: string[], onLine: (line: string) => void): Promise<void> {
  return new Promise((resolve, reject) => {
    const child = spawn(cmd, args, { stdio: ["ignore", "pipe", "pipe"] });
    let stderr = "";
    child.stderr.on("data", (d: Buffer) => {
      stderr = (stderr + d.toString("utf8")).slice(-4000);
    });
    let failure: Error | null = null;
    // Split the stream by hand: readline costs more than ffprobe itself on long clips.
    let rest = "";
    const take = (text: string) => {
      if (failure) return;
      const lines = text.split("\n");
      try {
        for (const l of lines) onLine(l);
      } catch (e) {
        failure = e as Error;
        child.kill("SIGKILL");
      }
    };
    child.stdout.setEncoding("utf8");
    child.stdout.on("data", (chunk: string) => {
      const text = rest + chunk;
      const cut = text.lastIndexOf("\n");
      if (cut < 0) {
        rest = text;
        return;
      }
      rest = text.slice(cut + 1);
      take(text.slice(0, cut));
    });
    child.stdout.on("end", () => {
      if (rest) take(rest);
      rest = "";
    });
    child.on("error", (e) => reject(new Error(`${cmd} could not be started: ${e.message}`)));
    // "close" fires after stdout has ended, so every line has been seen.
    child.on("close", (code) => {
      if (failure) reject(failure);
      else if (code !== 0) reject(new Error(`${cmd} failed (${code}): ${stderr.trim() || "no message"}`));
      else resolve();
    });
  });
}

/**
 * Every frame's time and key flag from a decoding pass (ffprobe -show_frames): slow, so only for
 * files whose packets do not all carry a time. MPEG program streams put a timestamp on a packet
 * only every so often (at most 0.7 s apart): the frames that carry one keep it, the others are
 * placed evenly between them (fillFrameTimes). The decoder's own "best effort" guesses are not
 * used: for H.264 in a program stream they give some frames a neighbour's decode time.
 */
async function decodedFrameTimes(file: string): Promise<{ pts: number[]; keyframes: number[] }> {
  const pts: (number | null)[] = [];
  const keyframes: number[] = [];
  const args = ["-v", "error", "-select_streams", "v:0", "-show_entries", "frame=key_frame,pts", "-of", "csv=p=1", file];
  await streamLines("ffprobe", args, (line) => {
    const p = parseProbeLine(line);
    if (p?.kind !== "frame") return;
    if (p.key) keyframes.push(pts.length);
    pts.push(p.time);
  });
  return { pts: fillFrameTimes(pts), keyframes };
}

export async function probePacketTimes(file: string): Promise<PacketTimes> {
  const packets: RawPacket[] = [];
  let stream: { timeBase: Rational; startPts: number | null } | null = null;
  let formatName = "";
  const args = [
    "-v",
    "error",
    "-select_streams",
    "v:0",
    "-show_entries",
    "packet=pts,dts,flags:stream=time_base,start_pts:format=format_name",
    "-of",
    "csv=p=1",
    file,
  ];
  await streamLines("ffprobe", args, (line) => {
    const p = parseProbeLine(line);
    if (p?.kind === "packet") packets.push(p.packet);
    else if (p?.kind === "stream") stream = { timeBase: p.timeBase, startPts: p.startPts };
    else if (p?.kind === "format") formatName = p.formatName;
  });
  const s = stream as { timeBase: Rational; startPts: number | null } | null;
  if (!s) throw new Error(`${file} has no video stream`);
  if (packets.length === 0) throw new Error(`${file} has no video packets`);
  // Only AVI's chunk slots make a dts the frame's time; elsewhere a packet without a pts needs the decoder.
  const isAvi = formatName.split(",").includes("avi");
  if (!isAvi && decodablePackets(packets).some((p) => p.pts === null)) {
    const frames = await decodedFrameTimes(file);
    if (frames.pts.length === 0) throw new Error(`${file} has no frame a decoder can show`);
    return { ...s, ...frames, clock: "pts" };
  }
  return { ...s, ...toDisplayOrder(packets) };
}

export async function probeVideoSize(file: string): Promise<{ width: number; height: number }> {
  let size: { width: number; height: number } | null = null;
  await streamLines("ffprobe", ["-v", "error", "-select_streams", "v:0", "-show_entries", "stream=width,height", "-of", "csv=p=0", file], (line) => {
    const m = /^(\d+),(\d+)/.exec(line);
    if (m && !size) size = { width: Number(m[1]), height: Number(m[2]) };
  });
  if (!size) throw new Error(`${file} has no video stream`);
  return size;
}
