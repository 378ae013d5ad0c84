// SMPTE ST 12-1 timecode for showing frames to people. Durations never come from timecodes:
// they come from the clip's own frame timestamps.

export interface FrameRate {
  num: number;
  den: number;
}

interface Scheme {
  /** Frames counted per second in the timecode (30 for 30000/1001). */
  base: number;
  /** Frame numbers skipped at the start of each minute not divisible by ten (0 when non-drop). */
  drop: number;
}

function scheme(rate: FrameRate): Scheme {
  if (rate.den === 1001 && (rate.num === 30000 || rate.num === 60000)) return { base: rate.num / 1000, drop: rate.num === 30000 ? 2 : 4 };
  if (rate.den <= 0 || rate.num <= 0) throw new Error("The frame rate must be positive.");
  return { base: Math.round(rate.num / rate.den), drop: 0 };
}

const pad = (n: number) => String(n).padStart(2, "0");

/** Frame index → "HH:MM:SS:FF" (";" before the frames when drop-frame). */
export function frameToTimecode(frame: number, rate: FrameRate): string {
  if (!Number.isInteger(frame) || frame < 0) throw new Error("A frame index is a whole number from 0.");
  const { base, drop } = scheme(rate);
  let f = frame;
  if (drop) {
    const perTenMinutes = base * 600 - drop * 9;
    const perMinute = base * 60 - drop;
    const tens = Math.floor(f / perTenMinutes);
    const rest = f % perTenMinutes;
    // Frame numbers dropped so far: 9 minutes' worth per ten minutes, plus those of this block.
    f += drop * 9 * tens + (rest > drop ? drop * Math.floor((rest - drop) / perMinute) : 0);
  }
  const ff = f % base;
  const totalSeconds = Math.floor(f / base);
  return `${pad(Math.floor(totalSeconds / 3600))}:${pad(Math.floor(totalSeconds / 60) % 60)}:${pad(totalSeconds % 60)}${drop ? ";" : ":"}${pad(ff)}`;
}

/** "HH:MM:SS:FF" or "HH:MM:SS;FF" → frame index; refuses timecodes that cannot exist. */
export function timecodeToFrame(tc: string, rate: FrameRate): number {
  const m = /^(\d{2}):(\d{2}):(\d{2})([:;.,])(\d{2})$/.exec(tc.trim());
  if (!m) throw new Error(`"${tc}" is not a timecode of the form HH:MM:SS:FF.`);
  const [h, min, s, ff] = [m[1], m[2], m[3], m[5]].map(Number);
  const { base, drop } = scheme(rate);
  if (min > 59 || s > 59) throw new Error(`"${tc}" has minutes or seconds over 59.`);
  if (ff >= base) throw new Error(`"${tc}" has frame ${ff}, but a second has only ${base} frames (00–${pad(base - 1)}).`);
  if (drop && s === 0 && ff < drop && min % 10 !== 0) {
    throw new Error(
      `"${tc}" does not exist in drop-frame timecode: frames 00${drop > 1 ? `–${pad(drop - 1)}` : ""} are skipped at the start of each minute not divisible by ten.`,
    );
  }
  const totalMinutes = h * 60 + min;
  return (totalMinutes * 60 + s) * base + ff - drop * (totalMinutes - Math.floor(totalMinutes / 10));
}
