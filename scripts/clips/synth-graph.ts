import { frameCodeFilter } from "../../lib/video/frame-code";
import type { Sprite } from "./synth-images";
import { type DropPlan, FINAL_OPACITY, type FramePlan, vfrSelectExpr } from "./synth-plan";
import type { Container, SynthOptions } from "./synth-options";

// The ffmpeg command that renders a clip, as an argument list. Pure.
//
// One pass, no per-pixel expressions: the stills are decoded once and repeated by `loop` (a
// reference, not a copy), drops are small overlays switched on by the frame's own time, and the
// only full-frame work is one copy, the sensor noise, 17 small boxes and the encoder.

export interface GraphInputs {
  surface: string;
  drops: { body: { file: string; sprite: Sprite }; glint: { file: string; sprite: Sprite } }[];
}

export const CODEC: Record<Container, "h264" | "mpeg4"> = { mp4: "h264", mkv: "h264", ts: "h264", avi: "mpeg4" };
const FORMAT: Record<Container, string> = { mp4: "mp4", mkv: "matroska", ts: "mpegts", avi: "avi" };

const sec = (v: number) => v.toFixed(9);

/** Still → endless stream at the base clock, one frame per tick, stopping after `frames` ticks. */
const still = (input: number, pixFmt: string, frames: number) =>
  `[${input}:v]scale=out_color_matrix=bt709:out_range=tv,format=${pixFmt},loop=loop=-1:size=1:start=0,setpts=N,trim=end_frame=${frames}`;

function dropLayers(d: DropPlan, i: GraphInputs["drops"][number], margin: number, base: FramePlan["base"], first: number, from: string, to: string): string[] {
  const life = d.clear - d.dispense;
  // Sprites only need frames until the drop is gone; overlay passes the frame through after that.
  const frames = Math.ceil((d.clear * base.num) / base.den) + 2;
  // The fade runs past the clear time to zero, so at the clear time it stands at FINAL_OPACITY
  // and the last trace then vanishes on the clear frame: the moment is exact, not a judgement.
  const bodyFade = `fade=t=out:st=${sec(d.dispense)}:d=${sec(life / (1 - FINAL_OPACITY))}:alpha=1`;
  const glintFade = `fade=t=out:st=${sec(d.dispense)}:d=${sec(0.4 * life)}:alpha=1`;
  const on = `enable='gte(t,${sec(d.dispense)})*lt(t,${sec(d.clear)})'`;
  const at = (s: Sprite) => {
    const x = 2 * Math.round((d.x + margin + s.dx - s.width / 2) / 2);
    const y = 2 * Math.round((d.y + margin + s.dy - s.height / 2) / 2);
    return `x=${x}:y=${y}`;
  };
  const b = `b${d.index}`;
  const g = `g${d.index}`;
  const mid = `m${d.index}`;
  return [
    `${still(first, "yuva420p", frames)},${bodyFade}[${b}]`,
    `${still(first + 1, "yuva420p", frames)},${glintFade}[${g}]`,
    `[${from}][${b}]overlay=${at(i.body.sprite)}:format=yuv420:eof_action=pass:${on}[${mid}]`,
    `[${mid}][${g}]overlay=${at(i.glint.sprite)}:format=yuv420:eof_action=pass:${on}[${to}]`,
  ];
}

/** Slow drift plus a faster tremor, never more than `margin` px from centre; crop snaps to even px. */
function shake(margin: number, seed: number): string {
  const p = (k: number) => ((seed * 7 + k * 13) % 31) / 5;
  const axis = (f1: number, f2: number, k: number) =>
    `${margin}+${(0.65 * margin).toFixed(2)}*sin(2*PI*${f1}*t+${p(k)})+${(0.3 * margin).toFixed(2)}*sin(2*PI*${f2}*t+${p(k + 1)})`;
  return `x='${axis(0.23, 1.7, 0)}':y='${axis(0.17, 2.3, 2)}'`;
}

export function filterGraph(o: SynthOptions, frames: FramePlan, drops: DropPlan[], inputs: GraphInputs, margin: number): string {
  const parts: string[] = [];
  const select = o.vfr ? `,select='${vfrSelectExpr()}'` : "";
  parts.push(`${still(0, "yuv420p", frames.baseCount)}${select}[s0]`);
  drops.forEach((d, k) => parts.push(...dropLayers(d, inputs.drops[k], margin, frames.base, 1 + 2 * k, `s${k}`, `s${k + 1}`)));
  // Luma only, temporal and uniform: chroma noise would cost bits without looking more like a sensor.
  const noise = o.noise > 0 ? `,noise=c0s=${o.noise}:c0f=t+u:c0_seed=${o.seed}` : "";
  parts.push(`[s${drops.length}]crop=w=${o.width}:h=${o.height}:${shake(margin, o.seed)}${noise},${frameCodeFilter(o.width, o.height)}[out]`);
  return parts.join(";");
}

export function ffmpegArgs(o: SynthOptions, frames: FramePlan, drops: DropPlan[], inputs: GraphInputs, margin: number): string[] {
  const rate = `${frames.base.num}/${frames.base.den}`;
  // -framerate sets the link's rate, which ffmpeg makes the encoder's time base (1 tick = 1 base frame).
  const input = (file: string) => ["-framerate", rate, "-i", file];
  const gop = String(Math.max(1, Math.round((2 * frames.nominal.num) / frames.nominal.den)));
  const bf = o.bframes ? "3" : "0";
  const codec =
    CODEC[o.container] === "h264"
      ? ["-c:v", "libx264", "-preset", o.preset, "-crf", "23", "-bf", bf, "-g", gop, "-pix_fmt", "yuv420p"]
      : ["-c:v", "mpeg4", "-q:v", "3", "-bf", bf, "-g", gop, "-pix_fmt", "yuv420p"];
  return [
    "-hide_banner",
    "-nostdin",
    "-v",
    "error",
    "-y",
    ...input(inputs.surface),
    ...inputs.drops.flatMap((d) => [...input(d.body.file), ...input(d.glint.file)]),
    "-filter_complex",
    filterGraph(o, frames, drops, inputs, margin),
    "-map",
    "[out]",
    "-fps_mode",
    "passthrough",
    ...codec,
    "-colorspace",
    "bt709",
    "-color_primaries",
    "bt709",
    "-color_trc",
    "bt709",
    ...(o.start > 0 ? ["-output_ts_offset", sec(o.start)] : []),
    "-map_metadata",
    "-1",
    "-f",
    FORMAT[o.container],
    o.out,
  ];
}
