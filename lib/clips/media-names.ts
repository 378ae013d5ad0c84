// Containers and codecs as people in a lab call them, from ffprobe's names. Pure.

export const CODECS: Record<string, string> = {
  h264: "H.264",
  hevc: "H.265 (HEVC)",
  vp8: "VP8",
  vp9: "VP9",
  av1: "AV1",
  mpeg4: "MPEG-4 Part 2",
  mpeg2video: "MPEG-2",
  mpeg1video: "MPEG-1",
  mjpeg: "Motion JPEG",
  prores: "ProRes",
};

export const codecName = (codec: string): string => CODECS[codec] ?? codec;

/** Raw elementary streams: pictures without a container, so without any timestamps. */
const RAW: Record<string, string> = { h264: "H.264", hevc: "H.265 (HEVC)", mpegvideo: "MPEG video", m4v: "MPEG-4 Part 2", vvc: "H.266" };

/** The raw stream's codec in words when the format is a raw elementary stream, else null. */
export function rawStreamName(format: string): string | null {
  return RAW[format.split(",")[0]] ?? null;
}

/** ffprobe's format name ("mov,mp4,m4a,3gp,3g2,mj2") as people call the container. */
export function containerName(format: string): string {
  const f = format.split(",");
  if (f.some((n) => ["mp4", "mov", "m4a", "3gp", "3g2", "mj2"].includes(n))) return "MP4 / QuickTime";
  if (f.includes("matroska") || f.includes("webm")) return "Matroska / WebM";
  if (f.includes("mpegts")) return "MPEG transport stream";
  if (f.includes("mpeg") || f.includes("vob")) return "MPEG program stream";
  if (f.includes("avi")) return "AVI";
  const raw = rawStreamName(format);
  if (raw) return `raw ${raw} stream`;
  return format;
}

/** The accepted containers in words, each once, for a refusal. */
export function acceptedInWords(accepted: readonly string[]): string {
  return [...new Set(accepted.map(containerName))].join(", ");
}
