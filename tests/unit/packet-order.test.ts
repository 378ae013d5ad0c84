import { describe, expect, it } from "vitest";
import { fillFrameTimes, parseProbeLine, parseRational, type RawPacket, toDisplayOrder } from "@/lib/frame-index/packet-order";

// Lines as ffprobe 5.1 prints them for `-show_entries packet=pts,dts,flags:stream=time_base,start_pts -of csv=p=1`.
const packets = (lines: string[]): RawPacket[] => lines.map(parseProbeLine).flatMap((p) => (p?.kind === "packet" ? [p.packet] : []));

describe("parseProbeLine", () => {
  it("reads packets and the stream line, and skips MPEG-TS program lines and side-data blanks", () => {
    expect(parseProbeLine("packet,131250,126000,K_,side_data,")).toEqual({ kind: "packet", packet: { pts: 131250, dts: 126000, key: true } });
    expect(parseProbeLine("packet,N/A,7,__")).toEqual({ kind: "packet", packet: { pts: null, dts: 7, key: false } });
    expect(parseProbeLine("stream,1/90000,131250")).toEqual({ kind: "stream", timeBase: { num: 1, den: 90000 }, startPts: 131250 });
    expect(parseProbeLine("stream,1/1000,N/A")).toEqual({ kind: "stream", timeBase: { num: 1, den: 1000 }, startPts: null });
    expect(parseProbeLine("program,stream,1/90000,131250")).toBeNull();
    expect(parseProbeLine("")).toBeNull();
  });

  it("refuses timestamps a double cannot hold exactly", () => {
    expect(() => parseProbeLine("packet,9007199254740993,0,K_")).toThrow(/safe integer/);
    expect(() => parseRational("1/0")).toThrow(/time base/);
  });
});

describe("toDisplayOrder", () => {
  it("sorts B-frame packets by pts and reports key frames by display index (mp4, edit list)", () => {
    const p = packets([
      "packet,0,-2002,K_",
      "packet,4004,-1001,__",
      "packet,2002,0,__",
      "packet,1001,1001,__",
      "packet,3003,2002,__",
      "packet,6006,3003,K_",
      "packet,5005,4004,__",
    ]);
    expect(toDisplayOrder(p)).toEqual({ pts: [0, 1001, 2002, 3003, 4004, 5005, 6006], keyframes: [0, 6], clock: "pts" });
  });

  it("keeps pts when mkv leaves dts out on reordered packets", () => {
    const p = packets(["packet,0,N/A,K_", "packet,133,N/A,__", "packet,67,0,__", "packet,33,33,__", "packet,100,67,__"]);
    expect(toDisplayOrder(p).pts).toEqual([0, 33, 67, 100, 133]);
  });

  it("falls back to the chunk slots (dts) when AVI gives no pts", () => {
    const h264 = packets(["packet,N/A,0,K_", "packet,N/A,1,__", "packet,N/A,2,__", "packet,N/A,30,K_"]);
    expect(toDisplayOrder(h264)).toEqual({ pts: [0, 1, 2, 30], keyframes: [0, 3], clock: "dts" });
    // MPEG-4 Part 2 with B-frames: pts only on some packets; mixing clocks would misorder them.
    const mpeg4 = packets(["packet,N/A,0,K_", "packet,N/A,1,__", "packet,2,2,__", "packet,3,3,__", "packet,N/A,4,__"]);
    expect(toDisplayOrder(mpeg4).pts).toEqual([0, 1, 2, 3, 4]);
  });

  it("leaves out the packets an edit list discards (MP4 cut by stream copy mid-GOP)", () => {
    expect(parseProbeLine("packet,-4096,-5120,KD")).toEqual({ kind: "packet", packet: { pts: -4096, dts: -5120, key: true, discard: true } });
    const p = packets(["packet,-1024,-2048,KD", "packet,512,-1536,__", "packet,-512,-1024,_D", "packet,0,-512,__", "packet,1024,0,__"]);
    expect(toDisplayOrder(p)).toEqual({ pts: [0, 512, 1024], keyframes: [], clock: "pts" });
  });

  it("leaves out the packets before the first keyframe and those shown before it", () => {
    const p = packets(["packet,300,100,__", "packet,200,200,__", "packet,500,300,K_", "packet,400,400,__", "packet,700,500,__", "packet,600,600,__"]);
    expect(toDisplayOrder(p)).toEqual({ pts: [500, 600, 700], keyframes: [0], clock: "pts" });
  });

  it("puts AVI keyframes where MPEG-4 Part 2 B-frames make them shown, not where they are stored", () => {
    // Decode order I P B B P B B I B B P: the second I is stored 7th but shown 9th (display index 9).
    const lines = [
      "packet,N/A,0,K_",
      "packet,N/A,1,__",
      "packet,2,2,__",
      "packet,3,3,__",
      "packet,N/A,4,__",
      "packet,5,5,__",
      "packet,6,6,__",
      "packet,N/A,7,K_",
      "packet,8,8,__",
      "packet,9,9,__",
      "packet,N/A,10,__",
    ];
    expect(toDisplayOrder(packets(lines))).toEqual({ pts: [0, 1, 2, 3, 4, 5, 6, 7, 8, 9, 10], keyframes: [0, 9], clock: "dts" });
  });

  it("refuses a packet with no time at all", () => {
    expect(() => toDisplayOrder([{ pts: null, dts: null, key: true }])).toThrow(/neither pts nor dts/);
  });
});

describe("fillFrameTimes", () => {
  it("places decoded frames without a time evenly between their neighbours, and at the edges by the usual interval", () => {
    expect(fillFrameTimes([null, 3600, 7200, null, 14400, 18000, null])).toEqual([0, 3600, 7200, 10800, 14400, 18000, 21600]);
  });

  it("treats a time that does not move forward as given to the wrong frame", () => {
    expect(fillFrameTimes([0, 3600, null, 14400, 14400, 18000])).toEqual([0, 3600, 7200, 10800, 14400, 18000]);
  });

  it("refuses a gap that whole, equal ticks cannot fill", () => {
    expect(() => fillFrameTimes([0, 3600, null, 8001])).toThrow(/cannot be placed evenly/);
  });
});
