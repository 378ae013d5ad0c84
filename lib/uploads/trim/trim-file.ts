// Trims a recording in the browser by stream copy: no re-encoding, so it is quick, but the result
// starts at the keyframe at or before the chosen start. The end is cut where the packets allow
// (copyEndFor), so the clip holds every frame up to the chosen end and no stray one after it. The input is mounted read-only (WORKERFS)
// instead of copied into wasm memory; the output is held in memory until it is returned as a File.
import type { FFFSType, LogEvent } from "@ffmpeg/ffmpeg";
import { guessType } from "@/lib/uploads/browser/transport";
import { loadFfmpeg } from "@/lib/uploads/trim/ffmpeg-loader";
import type { TrimSource } from "@/lib/clips/schema";
import { packetsAround, startTimeOf } from "@/lib/uploads/trim/trim-probe";
import { copyEndFor, secondsLabel, splitName, trimArgs, trimmedName } from "@/lib/uploads/trim/trim-rules";

let runs = 0;

export async function trimFile(file: File, start: number, end: number, onLog: (line: string) => void): Promise<{ file: File; source: TrimSource }> {
  const ffmpeg = await loadFfmpeg();
  const { ext } = splitName(file.name);
  const n = ++runs;
  const dir = `/trim-in-${n}`;
  const input = `${dir}/input${ext ? `.${ext}` : ""}`;
  const output = `trim-out-${n}${ext ? `.${ext}` : ".mp4"}`;
  const lines: string[] = [];
  const log = ({ message }: LogEvent) => {
    lines.push(message);
    if (lines.length > 20) lines.shift();
    onLog(message);
  };
  await ffmpeg.createDir(dir);
  await ffmpeg.mount("WORKERFS" as FFFSType, { blobs: [{ name: input.slice(dir.length + 1), data: file }] }, dir);
  ffmpeg.on("log", log);
  try {
    const sourceStartS = await startTimeOf(ffmpeg, input);
    const to = copyEndFor(await packetsAround(ffmpeg, input, end, sourceStartS), end);
    onLog(`Cutting the copy at decode time ${to.toFixed(3)} s so that it ends with the frame shown at ${secondsLabel(end)} s.`);
    const code = await ffmpeg.exec(trimArgs(input, output, start, to));
    if (code !== 0) throw new Error(`ffmpeg could not trim this file (exit code ${code}). Its last words: ${lines.slice(-3).join(" ") || "none"}`);
    const data = await ffmpeg.readFile(output);
    await ffmpeg.deleteFile(output).catch(() => undefined);
    if (typeof data === "string" || data.length === 0) throw new Error("ffmpeg wrote an empty file: is the window inside the recording?");
    const out = new File([data as Uint8Array<ArrayBuffer>], trimmedName(file.name, start, end), {
      type: file.type || guessType(file.name),
      lastModified: Date.now(),
    });
    return { file: out, source: { sourceName: file.name, sourceStartS: Math.max(0, sourceStartS), requestedStartS: start, requestedEndS: end } };
  } finally {
    ffmpeg.off("log", log);
    await ffmpeg.unmount(dir).catch(() => undefined);
    await ffmpeg.deleteDir(dir).catch(() => undefined);
  }
}
