// What ffprobe said about an uploaded file, turned into a verdict in words a technician understands.
import { acceptedInWords, containerName, rawStreamName } from "./media-names";
import type { Rational } from "../frame-index/summary";

export interface ProbeSummary {
  formatName: string;
  durationS: number | null;
  video: {
    index: number;
    codec: string;
    width: number;
    height: number;
    rotation: number;
    nominalRate: string | null;
    averageRate: string | null;
    timeBase: Rational;
    hasBFrames: boolean;
    declaredFrames: number | null;
  };
  audioStreams: number;
}

// biome-ignore lint/suspicious/noExplicitAny: ffprobe's JSON, read field by field and checked below
type Json = Record<string, any>;
export type Verdict = { ok: true; probe: ProbeSummary } | { ok: false; reason: string };

const STILL_IMAGES = /^(png_pipe|jpeg_pipe|bmp_pipe|gif|webp_pipe|tiff_pipe|image2|svg_pipe|pam_pipe|ppm_pipe)$/;

export function rational(s: string | undefined): Rational | null {
  const m = /^(\d+)\/(\d+)$/.exec(s ?? "");
  return m && Number(m[2]) > 0 ? { num: Number(m[1]), den: Number(m[2]) } : null;
}

/** From a failed ffprobe: the usual reasons, then a plain fallback. */
export function reasonFromProbeError(stderr: string, size: number): string {
  if (size === 0) return "The file is empty (0 bytes). Export the recording again and upload the new file.";
  if (/moov atom not found/i.test(stderr))
    return "The MP4 file is incomplete: its index (the 'moov' box) is missing, so the recording was probably cut off while it was being written or copied. Export it again.";
  if (/Invalid data found|could not find codec parameters|unknown format/i.test(stderr))
    return "This file is not a video recording Wickmark can read: its contents are not a known video format, whatever its name says.";
  if (/truncat|end of file|partial file/i.test(stderr)) return "The file ends early: it looks truncated. Upload the complete recording.";
  return `The file could not be read as a video (${stderr.trim().split("\n").pop()?.slice(0, 200) || "no detail"}).`;
}

export function verdictFromProbe(json: Json, acceptedContainers: readonly string[]): Verdict {
  const format = String(json.format?.format_name ?? "");
  const streams: Json[] = json.streams ?? [];
  const names = format.split(",");
  if (STILL_IMAGES.test(format)) return { ok: false, reason: `This is a still image (${format.replace(/_pipe$/, "").toUpperCase()}), not a video recording.` };
  const video = streams.find((s) => s.codec_type === "video" && !(s.disposition?.attached_pic === 1));
  const audio = streams.filter((s) => s.codec_type === "audio").length;
  if (!video)
    return { ok: false, reason: audio > 0 ? "The file has sound but no picture: it contains no video stream." : "The file contains no video stream." };
  const raw = rawStreamName(format);
  if (raw) return { ok: false, reason: rawStreamRefusal(raw) };
  if (!names.some((n) => acceptedContainers.includes(n))) {
    return {
      ok: false,
      reason: `This file is ${withArticle(containerName(format))} file, which this lab does not accept for timing. Export the recording as one of: ${acceptedInWords(acceptedContainers)}.`,
    };
  }
  const declaredFrames = video.nb_frames !== undefined ? Number(video.nb_frames) : null;
  if (declaredFrames === 0) return { ok: false, reason: "The video stream has no frames." };
  const timeBase = rational(video.time_base);
  if (!timeBase) return { ok: false, reason: "The video stream has no usable time base, so its frame times cannot be read." };
  return {
    ok: true,
    probe: {
      formatName: format,
      durationS: json.format?.duration !== undefined ? Number(json.format.duration) : null,
      video: {
        index: Number(video.index),
        codec: String(video.codec_name ?? "unknown"),
        width: Number(video.width ?? 0),
        height: Number(video.height ?? 0),
        rotation: rotationOf(video),
        nominalRate: video.r_frame_rate ?? null,
        averageRate: video.avg_frame_rate ?? null,
        timeBase,
        hasBFrames: Number(video.has_b_frames ?? 0) > 0,
        declaredFrames,
      },
      audioStreams: audio,
    },
  };
}

function rotationOf(video: Json): number {
  const side = (video.side_data_list ?? []).find((d: Json) => d.rotation !== undefined);
  const r = side ? Number(side.rotation) : Number(video.tags?.rotate ?? 0);
  return ((Math.round(r) % 360) + 360) % 360;
}

/** "an MPEG…", "a Matroska…", "an flv…": the article for a name as it is read aloud. */
export function withArticle(name: string): string {
  const vowelSound = /^[aeiouAEIOU]/.test(name) || /^[FHLMNRSXfhlmnrsx](?![a-z])/.test(name) || /^(flv|mkv|mxf|mpeg|mov|nut|rm|swf)\b/.test(name);
  return `${vowelSound ? "an" : "a"} ${name}`;
}

/**
 * A raw elementary stream has pictures but no clock: no frame carries a time, so no drop can be
 * timed from it. Refused, saying so and what to do.
 */
export function rawStreamRefusal(codec: string): string {
  return (
    `This file is a raw ${codec} stream: the pictures without a container, so no frame carries a time and drop times cannot be measured from it. ` +
    "Export the recording from the recorder in a container that keeps its timestamps (MP4, Matroska, or an MPEG program or transport stream) and upload that file."
  );
}
