// Turns ffprobe's packet list (decode order) into per-frame timestamps in display order.
// Pure: the caller feeds it the lines of
//   ffprobe -select_streams v:0 -show_entries packet=pts,dts,flags:stream=time_base,start_pts -of csv=p=1

export interface Rational {
  num: number;
  den: number;
}

export interface RawPacket {
  pts: number | null;
  dts: number | null;
  key: boolean;
}

export type ProbeLine = { kind: "packet"; packet: RawPacket } | { kind: "stream"; timeBase: Rational; startPts: number | null } | null;

function tick(field: string | undefined): number | null {
  if (field === undefined || field === "" || field === "N/A") return null;
  const v = Number(field);
  // Past 2^53 a number would round silently and two frames could share a timestamp.
  if (!Number.isSafeInteger(v)) throw new Error(`timestamp ${field} is not a safe integer`);
  return v;
}

export function parseRational(s: string): Rational {
  const m = /^(-?\d+)\/(\d+)$/.exec(s.trim());
  if (!m || Number(m[2]) === 0) throw new Error(`bad time base "${s}"`);
  return { num: Number(m[1]), den: Number(m[2]) };
}

/**
 * One CSV line. Lines of other sections ("program,stream,…" in MPEG-TS) and the empty lines
 * ffprobe prints for packet side data are ignored.
 */
export function parseProbeLine(line: string): ProbeLine {
  const f = line.split(",");
  if (f[0] === "packet") return { kind: "packet", packet: { pts: tick(f[1]), dts: tick(f[2]), key: (f[3] ?? "").startsWith("K") } };
  if (f[0] === "stream" && f[1]) return { kind: "stream", timeBase: parseRational(f[1]), startPts: tick(f[2]) };
  return null;
}

export interface DisplayOrder {
  /** One timestamp per frame, in display order, in the stream's time base. */
  pts: number[];
  /** Display indices of the key frames. */
  keyframes: number[];
  /**
   * Which packet field the times came from. AVI stores no presentation times: ffmpeg reports
   * pts N/A for H.264 in AVI (and for the reordered frames of MPEG-4 with B-frames); there each
   * chunk owns one slot of the stream's fixed rate, so the dts (the slot) is the frame's time.
   */
  clock: "pts" | "dts";
}

export function toDisplayOrder(packets: readonly RawPacket[]): DisplayOrder {
  // Mixing the two fields would interleave two clocks; when any pts is missing, use the slots for all.
  const clock = packets.every((p) => p.pts !== null) ? "pts" : "dts";
  const rows = packets.map((p, decodeIndex) => {
    const t = clock === "pts" ? p.pts : p.dts;
    if (t === null) throw new Error(`packet ${decodeIndex} has neither pts nor dts`);
    return { t, key: p.key, decodeIndex };
  });
  // Stable on equal times (a broken file), so the result does not depend on the sort's whims.
  rows.sort((a, b) => a.t - b.t || a.decodeIndex - b.decodeIndex);
  const keyframes: number[] = [];
  rows.forEach((r, i) => {
    if (r.key) keyframes.push(i);
  });
  return { pts: rows.map((r) => r.t), keyframes, clock };
}

/** pts × time base in seconds (for display; compare exact values with integer ticks). */
export const ticksToSeconds = (ticks: number, tb: Rational): number => (ticks * tb.num) / tb.den;
