import { describe, expect, it } from "vitest";
import { MARK_REASONS, markCheck } from "@/components/player/mark-rule";

// The one rule behind every mark button and mark key: a mark needs a paused, confirmed frame.
describe("markCheck", () => {
  it("allows a mark on a confirmed frame of a paused clip, and names the frame", () => {
    expect(markCheck({ status: "confirmed", frame: 12, paused: true })).toEqual({ ok: true, frame: 12 });
    expect(markCheck({ status: "confirmed", frame: 0, paused: true })).toEqual({ ok: true, frame: 0 });
  });

  it("refuses during playback, even on a frame matched to the index, and says to pause", () => {
    expect(markCheck({ status: "playing", frame: 40, paused: false })).toEqual({ ok: false, reason: MARK_REASONS.playing });
    expect(markCheck({ status: "playing", frame: null, paused: false })).toEqual({ ok: false, reason: MARK_REASONS.playing });
  });

  it("refuses a confirmed frame once the media element plays on (played by something else than the player)", () => {
    expect(markCheck({ status: "confirmed", frame: 12, paused: false })).toEqual({ ok: false, reason: MARK_REASONS.playing });
  });

  it("refuses while loading, seeking and on an unmatched picture, each with its own words", () => {
    expect(markCheck({ status: "loading", frame: null, paused: true })).toEqual({ ok: false, reason: MARK_REASONS.loading });
    expect(markCheck({ status: "seeking", frame: null, paused: true })).toEqual({ ok: false, reason: MARK_REASONS.seeking });
    expect(markCheck({ status: "unconfirmed", frame: null, paused: true })).toEqual({ ok: false, reason: MARK_REASONS.unconfirmed });
    expect(new Set(Object.values(MARK_REASONS)).size).toBe(4);
  });
});
