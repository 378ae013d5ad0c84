// The machine-readable frame code burned into synthetic clips: a row of 16 square blocks near the
// top-left corner inside a black strip; block i is white when bit i of the frame's display index
// is set. Tests read it back to prove that no frame was dropped, duplicated or reordered.

export const FRAME_CODE_BITS = 16;
/** The code wraps after this many frames (~36 min at 30 fps, ~18 min at 60 fps); see unwrapFrameCodes. */
export const FRAME_CODE_PERIOD = 2 ** FRAME_CODE_BITS;
/** Block edge at 1080 lines; other heights scale from it. */
export const FRAME_CODE_BLOCK_AT_1080 = 16;
/** Below 8 px a block no longer fills one 8×8 transform block and compression smears it into its neighbours. */
export const FRAME_CODE_MIN_BLOCK = 8;
/** Luma threshold between a black and a white block (8-bit; limited-range black is 16, white 235). */
export const FRAME_CODE_THRESHOLD = 128;

export interface FrameCodeGeometry {
  /** Left edge of block 0, in pixels of the frame the code was burned into. */
  x: number;
  y: number;
  /** Edge of one square block. */
  block: number;
  count: number;
  /** Black margin around the blocks, so the picture next to the strip cannot bleed into a block. */
  pad: number;
}

/**
 * Geometry for a frame of the given size. Block edges are multiples of 4 so that block borders
 * fall on chroma sample borders (4:2:0) and, at 1080p, on macroblock borders.
 */
export function frameCodeGeometry(width: number, height: number): FrameCodeGeometry {
  if (!Number.isInteger(width) || !Number.isInteger(height) || width <= 0 || height <= 0) throw new Error(`bad frame size ${width}x${height}`);
  const block = Math.max(FRAME_CODE_MIN_BLOCK, 4 * Math.round((FRAME_CODE_BLOCK_AT_1080 / 4) * (height / 1080)));
  const pad = block / 2;
  const g = { x: block, y: block, block, count: FRAME_CODE_BITS, pad };
  if (g.x + g.count * block + pad > width || g.y + block + pad > height) throw new Error(`frame ${width}x${height} is too small for the frame code`);
  return g;
}

/** The ffmpeg filter chain (comma-separated, no labels) that burns the code; `n` is the filter's own frame counter. */
export function frameCodeFilter(width: number, height: number): string {
  const g = frameCodeGeometry(width, height);
  const strip = `drawbox=x=${g.x - g.pad}:y=${g.y - g.pad}:w=${g.count * g.block + 2 * g.pad}:h=${g.block + 2 * g.pad}:color=black:t=fill`;
  const bits = Array.from({ length: g.count }, (_, i) => {
    // drawbox's enable is evaluated per frame with n = frames seen so far, i.e. the display index.
    const on = `eq(mod(floor(n/${2 ** i}),2),1)`;
    return `drawbox=x=${g.x + i * g.block}:y=${g.y}:w=${g.block}:h=${g.block}:color=white:t=fill:enable='${on}'`;
  });
  return [strip, ...bits].join(",");
}

/**
 * The read-back chain: crop the row of blocks and average each block to one grey pixel. The crop
 * is written relative to iw/ih, so a copy scaled to another size (a proxy) reads the same way.
 */
export function frameCodeReadFilter(width: number, height: number): string {
  const g = frameCodeGeometry(width, height);
  const rel = (v: number, of: number, dim: "iw" | "ih") => `${dim}*${v}/${of}`;
  const crop = `crop=w=${rel(g.count * g.block, width, "iw")}:h=${rel(g.block, height, "ih")}:x=${rel(g.x, width, "iw")}:y=${rel(g.y, height, "ih")}`;
  return `${crop},scale=${g.count}:1:flags=area`;
}

/** One luma value per block, left to right (block i = bit i). */
export function decodeFrameCode(gray: Uint8Array): number {
  if (gray.length !== FRAME_CODE_BITS) throw new Error(`a frame code has ${FRAME_CODE_BITS} blocks, got ${gray.length}`);
  let n = 0;
  for (let i = 0; i < FRAME_CODE_BITS; i++) if (gray[i] >= FRAME_CODE_THRESHOLD) n += 2 ** i;
  return n;
}

/**
 * Codes read in display order, with each wrap past FRAME_CODE_PERIOD counted. A backwards step of
 * more than half a period can only be a wrap: real faults (a dropped or repeated frame) move by a few.
 */
export function unwrapFrameCodes(codes: readonly number[]): number[] {
  const out: number[] = [];
  let base = 0;
  let prev: number | undefined;
  for (const c of codes) {
    if (prev !== undefined && c < prev - FRAME_CODE_PERIOD / 2) base += FRAME_CODE_PERIOD;
    out.push(base + c);
    prev = c;
  }
  return out;
}
