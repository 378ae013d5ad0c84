import { describe, expect, it } from "vitest";
import { type AssistSeat, assistDecision, claimsFirstReader } from "@/lib/assist/visibility";

// The independence rule of the reading assist, seat by seat.
const seat = (o: Partial<AssistSeat>): AssistSeat => ({
  visibility: "first_reader_before",
  viewerId: "ana",
  viewerReads: true,
  bothReadingsIn: false,
  ownSubmitted: false,
  firstReaderId: null,
  ...o,
});

describe("assistDecision", () => {
  it("default: the first reader sees it before marking, the second not until both readings are in", () => {
    expect(assistDecision(seat({})).visible).toBe(true);
    expect(claimsFirstReader(seat({}))).toBe(true);
    expect(assistDecision(seat({ firstReaderId: "ana" })).visible).toBe(true);
    expect(claimsFirstReader(seat({ firstReaderId: "ana" }))).toBe(false);
    const second = assistDecision(seat({ viewerId: "ben", firstReaderId: "ana" }));
    expect(second.visible).toBe(false);
    expect(second.reason).toMatch(/second reader/);
    // Even once the second reader's own reading is submitted, until the first's is in too.
    expect(assistDecision(seat({ viewerId: "ben", firstReaderId: "ana", ownSubmitted: true })).visible).toBe(false);
    expect(assistDecision(seat({ viewerId: "ben", firstReaderId: "ana", bothReadingsIn: true })).visible).toBe(true);
  });

  it("after own marks: each reader only once their own reading is submitted", () => {
    const v = "after_own_marks" as const;
    expect(assistDecision(seat({ visibility: v })).visible).toBe(false);
    expect(assistDecision(seat({ visibility: v, firstReaderId: "ana" })).visible).toBe(false);
    expect(assistDecision(seat({ visibility: v, ownSubmitted: true })).visible).toBe(true);
    expect(claimsFirstReader(seat({ visibility: v }))).toBe(false);
  });

  it("nobody: hidden from every seat, readers or not, before and after", () => {
    for (const o of [{}, { viewerReads: false }, { bothReadingsIn: true }, { ownSubmitted: true }]) {
      expect(assistDecision(seat({ visibility: "nobody", ...o })).visible).toBe(false);
    }
  });

  it("someone who does not read drops is never blind to it", () => {
    expect(assistDecision(seat({ viewerId: "lee", viewerReads: false, firstReaderId: "ana" })).visible).toBe(true);
    expect(assistDecision(seat({ visibility: "after_own_marks", viewerReads: false })).visible).toBe(true);
    expect(claimsFirstReader(seat({ viewerReads: false }))).toBe(false);
  });
});
