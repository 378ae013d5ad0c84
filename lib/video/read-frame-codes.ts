import "server-only";
import { spawn } from "node:child_process";
import { probeVideoSize } from "../frame-index/packets";
import { decodeFrameCode, FRAME_CODE_BITS, frameCodeReadFilter, unwrapFrameCodes } from "./frame-code";

/**
 * The frame code of every frame of `file`, in display order, from one ffmpeg pass. `opts` is the
 * size the code was burned at (default: the file's own size), so a scaled copy reads correctly.
 * Output is streamed: 16 bytes per frame, whatever the clip's length.
 */
export async function readFrameCodes(file: string, opts?: { width: number; height: number }): Promise<number[]> {
  const size = opts ?? (await probeVideoSize(file));
  const args = [
    "-hide_banner",
    "-nostdin",
    "-v",
    "error",
    "-i",
    file,
    "-map",
    "0:v:0",
    "-vf",
    frameCodeReadFilter(size.width, size.height),
    // passthrough: one output frame per decoded frame, never a duplicate or a drop to fit a rate.
    "-fps_mode",
    "passthrough",
    "-f",
    "rawvideo",
    "-pix_fmt",
    "gray",
    "pipe:1",
  ];
  return new Promise((resolve, reject) => {
    const child = spawn("ffmpeg", args, { stdio: ["ignore", "pipe", "pipe"] });
    const codes: number[] = [];
    const frame = new Uint8Array(FRAME_CODE_BITS);
    let filled = 0;
    child.stdout.on("data", (chunk: Buffer) => {
      // Chunks split frames anywhere: carry a partial frame over to the next chunk.
      let i = 0;
      while (i < chunk.length) {
        const take = Math.min(FRAME_CODE_BITS - filled, chunk.length - i);
        frame.set(chunk.subarray(i, i + take), filled);
        filled += take;
        i += take;
        if (filled === FRAME_CODE_BITS) {
          codes.push(decodeFrameCode(frame));
          filled = 0;
        }
      }
    });
    let stderr = "";
    child.stderr.on("data", (d: Buffer) => {
      stderr = (stderr + d.toString("utf8")).slice(-4000);
    });
    child.on("error", (e) => reject(new Error(`ffmpeg could not be started: ${e.message}`)));
    child.on("close", (code) => {
      if (code !== 0) reject(new Error(`ffmpeg failed reading frame codes of ${file} (${code}): ${stderr.trim()}`));
      else if (filled !== 0) reject(new Error(`ffmpeg ended inside a frame (${filled} of ${FRAME_CODE_BITS} bytes)`));
      else resolve(unwrapFrameCodes(codes));
    });
  });
}
