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
  /** Flagged "D" by ffprobe: an edit list (or the container) says no decoder shows this packet's frame. */
  discard?: boolean;
}

export type ProbeLine =
  | { kind: "packet"; packet: RawPacket }
  | { kind: "stream"; timeBase: Rational; startPts: number | null }
  | { kind: "format"; formatName: string }
  | { kind: "frame"; key: boolean; time: number | null }
  | null;

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
  if (f[0] === "packet") {
    // Flags are one letter a position: K (key), D (discard), C (corrupt), "_" when unset.
    const flags = f[3] ?? "";
    const packet: RawPacket = { pts: tick(f[1]), dts: tick(f[2]), key: flags[0] === "K" };
    if (flags[1] === "D") packet.discard = true;
    return { kind: "packet", packet };
  }
  if (f[0] === "format" && f[1]) return { kind: "format", formatName: f.slice(1).join(",") };
  // From -show_entries frame=key_frame,pts (decoded frames, in display order).
  if (f[0] === "frame" && f[1]) return { kind: "frame", key: f[1] === "1", time: tick(f[2]) };
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

/**
 * The packets whose frames a decoder outputs, in decode order: not those an edit list discards
 * (a stream copy cut mid-GOP keeps the GOP's earlier packets only as references), not those before
 * the first keyframe (they reference pictures the file does not have), and not those after it that
 * would be shown before it (the leading frames of an open GOP, same reason).
 */
export function decodablePackets(packets: readonly RawPacket[]): RawPacket[] {
  // A discarded keyframe still starts the decoding: look for the first key among all packets.
  const first = packets.findIndex((p) => p.key);
  const fromKey = first < 0 ? packets : packets.slice(first);
  const keyPts = fromKey[0]?.pts ?? null;
  const leading = (p: RawPacket) => keyPts !== null && p.pts !== null && p.pts < keyPts && !p.discard;
  return fromKey.filter((p, i) => !p.discard && !(i > 0 && leading(p)));
}

/**
 * Display order of AVI chunks, as decode indices. MPEG-4 Part 2 with B-frames stores each
 * reference frame (I or P) before the B-frames shown ahead of it; ffmpeg then gives the B-frames a
 * pts and leaves the reference frames without. A reference frame is shown when the next one
 * arrives (or at the end). With no pts at all (H.264 in AVI) the chunks are kept in file order.
 */
function aviDisplayOrder(packets: readonly RawPacket[]): number[] {
  if (!packets.some((p) => p.pts !== null)) return packets.map((_, i) => i);
  const order: number[] = [];
  let held: number | null = null;
  packets.forEach((p, i) => {
    if (p.pts !== null) return void order.push(i);
    if (held !== null) order.push(held);
    held = i;
  });
  if (held !== null) order.push(held);
  return order;
}

export function toDisplayOrder(all: readonly RawPacket[]): DisplayOrder {
  const packets = decodablePackets(all);
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
  if (clock === "pts") {
    rows.forEach((r, i) => {
      if (r.key) keyframes.push(i);
    });
  } else {
    // Each chunk owns one slot, so the sorted slots are the frame times; but the keyframes sit
    // where the frames are shown, not where they are stored.
    aviDisplayOrder(packets).forEach((d, i) => {
      if (packets[d].key) keyframes.push(i);
    });
  }
  return { pts: rows.map((r) => r.t), keyframes, clock };
}

/**
 * Decoded frames (display order) of which a few carry no time even after decoding: an MPEG program
 * stream stamps only some packets. Each gap is filled in even steps between its neighbours, and an
 * edge with the median interval; refused when a gap cannot be split into whole, equal ticks (the
 * rate changed inside it), because a guessed time is no evidence.
 */
export function fillFrameTimes(stamped: readonly (number | null)[]): number[] {
  // Display order only moves forward: a time that is not below the next stamped one was handed to
  // the wrong frame (ffmpeg does this with H.264 in a program stream) and is placed like a missing one.
  const times = [...stamped];
  let next: number | null = null;
  for (let i = times.length - 1; i >= 0; i--) {
    if (times[i] === null) continue;
    if (next !== null && times[i]! >= next) times[i] = null;
    else next = times[i];
  }
  const known = times.flatMap((t, i) => (t === null ? [] : [i]));
  if (known.length === 0) throw new Error("no decoded frame carries a timestamp");
  const steps = known
    .slice(1)
    .flatMap((k, j) => (k === known[j] + 1 ? [times[k]! - times[known[j]]!] : []))
    .sort((a, b) => a - b);
  const median = steps.length ? steps[Math.floor(steps.length / 2)] : 0;
  const out = [...times];
  const first = known[0];
  const last = known[known.length - 1];
  if ((first > 0 || last < times.length - 1) && median <= 0) throw new Error("too few decoded frames carry a timestamp to place the others");
  for (let i = first - 1; i >= 0; i--) out[i] = out[i + 1]! - median;
  for (let i = last + 1; i < times.length; i++) out[i] = out[i - 1]! + median;
  for (let j = 1; j < known.length; j++) {
    const [a, b] = [known[j - 1], known[j]];
    if (b === a + 1) continue;
    const step = (times[b]! - times[a]!) / (b - a);
    if (!Number.isInteger(step) || step <= 0)
      throw new Error(`frames ${a + 1} to ${b - 1} carry no timestamp and cannot be placed evenly between their neighbours`);
    for (let i = a + 1; i < b; i++) out[i] = times[a]! + step * (i - a);
  }
  return out as number[];
}

/** pts × time base in seconds (for display; compare exact values with integer ticks). */
export const ticksToSeconds = (ticks: number, tb: Rational): number => (ticks * tb.num) / tb.den;
