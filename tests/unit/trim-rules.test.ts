import { describe, expect, it } from "vitest";
import { canTrimInBrowser, copyEndFor, formatTime, parsePacketCsv, parseTime, rangeProblem, trimArgs, trimmedName } from "@/lib/uploads/trim/trim-rules";

describe("times typed by people", () => {
  it("reads seconds, m:ss and h:mm:ss, with a point or a comma", () => {
    expect(parseTime("75")).toBe(75);
    expect(parseTime(" 75.5 ")).toBe(75.5);
    expect(parseTime("1:15.5")).toBe(75.5);
    expect(parseTime("0:06")).toBe(6);
    expect(parseTime("1:00:01,25")).toBe(3601.25);
    expect(parseTime("1:75")).toBeNull();
    expect(parseTime("-3")).toBeNull();
    expect(parseTime("three")).toBeNull();
  });

  it("shows times as m:ss.mmm", () => {
    expect(formatTime(0)).toBe("0:00.000");
    expect(formatTime(75.5)).toBe("1:15.500");
    expect(formatTime(3601.25)).toBe("1:00:01.250");
  });

  it("names the trimmed file after the original and the window", () => {
    expect(trimmedName("drop run 3.mp4", 3, 6)).toBe("drop run 3-trim-3-6.mp4");
    expect(trimmedName("clip.MOV", 1.5, 62.125)).toBe("clip-trim-1.5-62.125.MOV");
    expect(trimmedName("noext", 0, 2)).toBe("noext-trim-0-2");
  });

  it("explains a wrong window in words", () => {
    expect(rangeProblem(null, 5, 10)).toMatch(/Give the start/);
    expect(rangeProblem(6, 6, 10)).toBe("The end must come after the start.");
    expect(rangeProblem(11, 12, 10)).toMatch(/start is past the end of the recording \(0:10\.000\)/);
    expect(rangeProblem(3, 10.5, 10)).toMatch(/end is past the end/);
    expect(rangeProblem(3, 6, 10)).toBeNull();
    expect(rangeProblem(3, 6, null)).toBeNull();
  });

  it("keeps files over 1.5 GB out of the browser's memory", () => {
    expect(canTrimInBrowser(1.5 * 1024 ** 3)).toBe(true);
    expect(canTrimInBrowser(1.5 * 1024 ** 3 + 1)).toBe(false);
    expect(canTrimInBrowser(0)).toBe(false);
  });
});

// Packets (pts,dts in seconds) that Debian's ffmpeg 5.1 / libx264 (veryfast, B-pyramid, -g 25) wrote
// at 25 fps, in file order, around 6.0 s; a keyframe at 6.00 and one at 5.00 (ffprobe -show_entries packet=pts_time,dts_time).
const CSV = `5.000000,4.920000
5.120000,4.960000
5.040000,5.000000
5.080000,5.040000
5.280000,5.080000
5.200000,5.120000
5.160000,5.160000
5.240000,5.200000
5.400000,5.240000
5.320000,5.280000
5.360000,5.320000
5.560000,5.360000
5.480000,5.400000
5.440000,5.440000
5.520000,5.480000
5.640000,5.520000
5.600000,5.560000
5.800000,5.600000
5.720000,5.640000
5.680000,5.680000
5.760000,5.720000
5.920000,5.760000
5.840000,5.800000
5.880000,5.840000
5.960000,5.880000
6.000000,5.920000
6.160000,5.960000
6.080000,6.000000
6.040000,6.040000
6.120000,6.080000
`;

describe("copyEndFor", () => {
  const packets = parsePacketCsv(CSV, 0);

  it("cuts before the next reference frame when the end falls on a keyframe", () => {
    // -to 6 would keep the frame at 6.16 (decoded at 5.96) and lose 6.04–6.12 shown before it.
    expect(copyEndFor(packets, 6)).toBeCloseTo(5.94, 6);
  });

  it("keeps the later reference that the last frames before the end need, with nothing missing", () => {
    // Frames up to 5.48 are wanted; 5.56 is their reference, so 5.52 must come too (cut after dts 5.48).
    expect(copyEndFor(packets, 5.5)).toBeCloseTo(5.5, 6);
  });

  it("keeps everything when the end is past the packets read", () => {
    // ffmpeg's stream copy stops at the first packet whose decode time reaches -to (the rule the
    // function's own comment states): every packet read must decode before the value returned.
    const to = copyEndFor(packets, 9);
    expect(packets.filter((p) => p.dts >= to)).toEqual([]);
    expect(Math.max(...packets.map((p) => p.dts))).toBeCloseTo(6.08, 6);
    expect(copyEndFor([], 4)).toBe(4);
  });

  it("shifts ffprobe's times to the recording's start", () => {
    expect(parsePacketCsv("10.540000,10.500000\nN/A,10.54\n\n", 10.5)).toEqual([
      { pts: expect.closeTo(0.04, 9), dts: 0 },
      { pts: Number.NaN, dts: expect.closeTo(0.04, 9) },
    ]);
  });
});

describe("what a trimmed clip really holds", () => {
  const trim = { sourceName: "run 3.mp4", sourceStartS: 10.5, requestedStartS: 1, requestedEndS: 7 };
  it("gives the kept frames in the original's seconds (its start time taken off), and says why they start earlier", async () => {
    const { trimKept } = await import("@/lib/clips/trim-provenance");
    // The clip keeps the original's timestamps: 10.5 s (the original's first frame) + 0 s to + 7.04 s, in a 1/12800 time base.
    const kept = trimKept(trim, { firstPts: 10.5 * 12800, lastPts: 17.54 * 12800, timeBase: { num: 1, den: 12800 } });
    expect(kept).toMatchObject({ keptFirstS: 0, keptLastS: 7.04 });
    expect(kept.note).toBe(
      "Trimmed in the browser from run 3.mp4: asked for 1 s to 7 s; kept the frames shown from 0 s to 7.04 s of the original. It starts before the start asked for because a copy without re-encoding must begin at a keyframe.",
    );
    expect(trimKept(trim, null).note).toBe(
      "Trimmed in the browser from run 3.mp4: asked for 1 s to 7 s; what was kept is known once the frame index is built.",
    );
  });

  it("copies with the original's timestamps kept", () => {
    expect(trimArgs("in.mp4", "out.mp4", 1, 7.02)).toEqual([
      "-hide_banner",
      "-ss",
      "1",
      "-to",
      "7.020000",
      "-i",
      "in.mp4",
      "-c",
      "copy",
      "-map",
      "0",
      "-copyts",
      "out.mp4",
    ]);
  });
});
