import { describe, expect, it } from "vitest";
import {
  decodeFrameCode,
  FRAME_CODE_BITS,
  FRAME_CODE_PERIOD,
  frameCodeFilter,
  frameCodeGeometry,
  frameCodeReadFilter,
  unwrapFrameCodes,
} from "@/lib/video/frame-code";

const BLACK = 16; // limited-range luma
const WHITE = 235;

/** The grey values ffmpeg would read back for display index n. */
const grayFor = (n: number, black = BLACK, white = WHITE) => Uint8Array.from({ length: FRAME_CODE_BITS }, (_, i) => ((n >> i) & 1 ? white : black));

describe("frame code geometry", () => {
  it("uses 16 px blocks one block in from the corner at 1080p", () => {
    expect(frameCodeGeometry(1920, 1080)).toEqual({ x: 16, y: 16, block: 16, count: 16, pad: 8 });
  });

  it("scales with the frame height in steps of 4 px, never below 8 px", () => {
    expect(frameCodeGeometry(3840, 2160).block).toBe(32);
    expect(frameCodeGeometry(1280, 720).block).toBe(12);
    expect(frameCodeGeometry(640, 360).block).toBe(8);
    expect(frameCodeGeometry(320, 180).block).toBe(8);
  });

  it("refuses a frame the strip does not fit", () => {
    expect(() => frameCodeGeometry(120, 90)).toThrow(/too small/);
    expect(() => frameCodeGeometry(0, 90)).toThrow(/bad frame size/);
  });
});

describe("decodeFrameCode", () => {
  it("reads bit i from block i, left to right", () => {
    for (const n of [0, 1, 2, 3, 255, 256, 1000, 4095, 54321, 65535]) expect(decodeFrameCode(grayFor(n))).toBe(n);
  });

  it("thresholds at mid-grey, so compression blur and full-range levels still read", () => {
    expect(decodeFrameCode(grayFor(0xa5c3, 127, 128))).toBe(0xa5c3);
    expect(decodeFrameCode(grayFor(0x5a3c, 0, 255))).toBe(0x5a3c);
    expect(decodeFrameCode(grayFor(0x1234, 60, 190))).toBe(0x1234);
  });

  it("needs exactly one value per block", () => {
    expect(() => decodeFrameCode(new Uint8Array(15))).toThrow(/16 blocks/);
    expect(() => decodeFrameCode(new Uint8Array(32))).toThrow(/16 blocks/);
  });
});

describe("frameCodeFilter", () => {
  // Split between filters only: the enable expressions contain commas of their own.
  const filters = (w: number, h: number) =>
    frameCodeFilter(w, h)
      .split(",drawbox=")
      .map((f, i) => (i === 0 ? f : `drawbox=${f}`));
  const chain = filters(1920, 1080);

  it("draws a black strip with padding, then one white box per bit", () => {
    expect(chain).toHaveLength(17);
    expect(chain[0]).toBe("drawbox=x=8:y=8:w=272:h=32:color=black:t=fill");
    expect(chain[1]).toBe("drawbox=x=16:y=16:w=16:h=16:color=white:t=fill:enable='eq(mod(floor(n/1),2),1)'");
    expect(chain[16]).toBe("drawbox=x=256:y=16:w=16:h=16:color=white:t=fill:enable='eq(mod(floor(n/32768),2),1)'");
  });

  it("lights exactly the blocks whose bits are set (the enable expressions, evaluated)", () => {
    const divisors = chain.slice(1).map((f) => Number(/floor\(n\/(\d+)\)/.exec(f)![1]));
    const xs = chain.slice(1).map((f) => Number(/^drawbox=x=(\d+)/.exec(f)![1]));
    expect(xs).toEqual(Array.from({ length: 16 }, (_, i) => 16 + 16 * i));
    for (const n of [0, 1, 2, 7, 300, 1799, 32768, 54000, 65535]) {
      const lit = divisors.map((k) => Math.floor(n / k) % 2 === 1);
      expect(decodeFrameCode(Uint8Array.from(lit, (on) => (on ? WHITE : BLACK)))).toBe(n);
    }
  });

  it("scales the boxes with the frame", () => {
    expect(filters(1280, 720)[1]).toBe("drawbox=x=12:y=12:w=12:h=12:color=white:t=fill:enable='eq(mod(floor(n/1),2),1)'");
  });
});

describe("frameCodeReadFilter", () => {
  it("crops the row of blocks relative to the input size and averages each block", () => {
    expect(frameCodeReadFilter(1920, 1080)).toBe("crop=w=iw*256/1920:h=ih*16/1080:x=iw*16/1920:y=ih*16/1080,scale=16:1:flags=area");
  });
});

describe("unwrapFrameCodes", () => {
  it("counts wraps past 65535 and leaves other sequences alone", () => {
    expect(unwrapFrameCodes([65533, 65534, 65535, 0, 1])).toEqual([65533, 65534, 65535, 65536, 65537]);
    expect(unwrapFrameCodes([65535, 0, 65535, 0])).toEqual([65535, 65536, 2 * FRAME_CODE_PERIOD - 1, 2 * FRAME_CODE_PERIOD]);
    expect(unwrapFrameCodes([0, 1, 3, 2, 2, 4])).toEqual([0, 1, 3, 2, 2, 4]);
    expect(unwrapFrameCodes([])).toEqual([]);
  });
});
