// Pure rules of the in-browser trim: reading typed times, naming the result, and which files fit.

/** Stream copy keeps the whole file in the browser's memory (wasm): above this, upload it whole. */
export const TRIM_MAX_BYTES = 1.5 * 1024 ** 3;

export function canTrimInBrowser(size: number): boolean {
  return size > 0 && size <= TRIM_MAX_BYTES;
}

/** "75", "75.5", "1:15.5" or "0:01:15.5" as seconds; null when it is not a time. */
export function parseTime(text: string): number | null {
  const t = text.trim().replace(",", ".");
  if (!/^\d+(\.\d*)?$|^\d+(:[0-5]?\d){1,2}(\.\d*)?$/.test(t)) return null;
  const parts = t.split(":").map(Number);
  const seconds = parts.reduce((acc, p) => acc * 60 + p, 0);
  return Number.isFinite(seconds) ? seconds : null;
}

/** Seconds as m:ss.mmm (h:mm:ss.mmm past an hour), the form the time fields show. */
export function formatTime(seconds: number): string {
  const ms = Math.round(seconds * 1000);
  const h = Math.floor(ms / 3_600_000);
  const m = Math.floor(ms / 60_000) % 60;
  const s = ((ms % 60_000) / 1000).toFixed(3).padStart(6, "0");
  return h ? `${h}:${String(m).padStart(2, "0")}:${s}` : `${m}:${s}`;
}

/** Seconds for a file name and for ffmpeg: at most three decimals, no trailing zeros. */
export function secondsLabel(seconds: number): string {
  return seconds.toFixed(3).replace(/\.?0+$/, "");
}

export function splitName(name: string): { stem: string; ext: string } {
  const dot = name.lastIndexOf(".");
  return dot > 0 ? { stem: name.slice(0, dot), ext: name.slice(dot + 1) } : { stem: name, ext: "" };
}

/** `<original>-trim-<start>-<end>.<same extension>` */
export function trimmedName(original: string, start: number, end: number): string {
  const { stem, ext } = splitName(original);
  return `${stem}-trim-${secondsLabel(start)}-${secondsLabel(end)}${ext ? `.${ext}` : ""}`;
}

/** What is wrong with a start and end, in words; null when they make a window inside the clip. */
export function rangeProblem(start: number | null, end: number | null, duration: number | null): string | null {
  if (start === null) return "Give the start as seconds (75.5) or minutes and seconds (1:15.5).";
  if (end === null) return "Give the end as seconds (75.5) or minutes and seconds (1:15.5).";
  if (end <= start) return "The end must come after the start.";
  if (duration !== null && start >= duration) return `The start is past the end of the recording (${formatTime(duration)}).`;
  if (duration !== null && end > duration + 0.001) return `The end is past the end of the recording (${formatTime(duration)}).`;
  return null;
}

/**
 * ffmpeg's arguments for the trim: a stream copy from the keyframe at or before `start` up to the
 * decode time `to` (copyEndFor), every stream kept. -copyts keeps the original's timestamps on
 * every packet, so the server reads from the clip's own frames where each sat in the original.
 */
export function trimArgs(input: string, output: string, start: number, to: number): string[] {
  return ["-hide_banner", "-ss", secondsLabel(start), "-to", to.toFixed(6), "-i", input, "-c", "copy", "-map", "0", "-copyts", output];
}

/** The note beside a trimmed upload; the frames really kept are shown on the clip's page once indexed. */
export function trimmedNote(sourceName: string, start: number, end: number): string {
  return `Trimmed in the browser from ${sourceName}: asked for ${secondsLabel(start)} s to ${secondsLabel(end)} s. The clip's page shows which frames of the original were kept: a copy without re-encoding starts at the keyframe at or before the start.`;
}

/** One video packet's timestamps in seconds since the start of the recording, in file (decode) order. */
export interface PacketTime {
  pts: number;
  dts: number;
}

/**
 * The `-to` to give ffmpeg so that a stream copy ends cleanly at `end`. ffmpeg stops copying at the
 * first packet whose decode time reaches `-to`. With B-frames the next reference frame is decoded
 * before the frames shown just ahead of it, so `-to end` keeps that stray later frame and drops
 * the ones shown between. Instead: cut after the last packet shown at or before `end`, extended
 * until no frame is missing before the latest one kept. The clip then ends with every frame up to
 * `end` and, at most, the few later frames those need as references (always consecutive).
 */
export function copyEndFor(packets: readonly PacketTime[], end: number): number {
  const ok = packets.filter((p) => Number.isFinite(p.pts) && Number.isFinite(p.dts));
  let k = -1;
  ok.forEach((p, i) => {
    if (p.pts <= end + 1e-6) k = i;
  });
  if (k < 0) return end;
  for (;;) {
    const latest = Math.max(...ok.slice(0, k + 1).map((p) => p.pts));
    let next = k;
    for (let j = k + 1; j < ok.length; j++) if (ok[j].pts < latest - 1e-6) next = j;
    if (next === k) break;
    k = next;
  }
  if (k === ok.length - 1) return ok[k].dts + 1; // the recording (or what was read of it) ends here: keep it all
  return (ok[k].dts + ok[k + 1].dts) / 2;
}

/** ffprobe's `pts_time,dts_time` lines, shifted to start at the recording's start time. */
export function parsePacketCsv(csv: string, startTime: number): PacketTime[] {
  return csv
    .split("\n")
    .map((line) => line.trim().split(","))
    .filter((f) => f.length >= 2 && f[0] !== "")
    .map(([pts, dts]) => ({ pts: Number(pts) - startTime, dts: Number(dts) - startTime }));
}
