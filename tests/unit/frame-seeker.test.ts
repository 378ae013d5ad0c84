import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { mediaTimes } from "@/components/player/frame-math";
import { FrameSeeker, type SeekerState } from "@/components/player/frame-seeker";

// A stand-in for the browser's <video>: a seek completes after `seekMs`, paints the frame the
// test chooses (by default the one whose interval holds the time), and reports its media time.
class FakeVideo extends EventTarget {
  paused = true;
  seeking = false;
  seeks: number[] = [];
  paint: (t: number) => number | null;
  private callbacks = new Map<number, VideoFrameRequestCallback>();
  private next = 1;
  private time = 0;
  constructor(
    times: number[],
    private seekMs = 20,
  ) {
    super();
    this.paint = (t) => [...times].reverse().find((s) => s <= t) ?? null;
  }
  get currentTime() {
    return this.time;
  }
  set currentTime(t: number) {
    this.time = t;
    this.seeks.push(t);
    this.seeking = true;
    setTimeout(() => {
      this.seeking = false;
      const shown = this.paint(t);
      if (shown !== null) for (const [id, cb] of [...this.callbacks]) this.callbacks.delete(id), cb(0, { mediaTime: shown } as VideoFrameCallbackMetadata);
      this.dispatchEvent(new Event("seeked"));
    }, this.seekMs);
  }
  requestVideoFrameCallback(cb: VideoFrameRequestCallback) {
    this.callbacks.set(this.next, cb);
    return this.next++;
  }
  cancelVideoFrameCallback(id: number) {
    this.callbacks.delete(id);
  }
  pause() {
    this.paused = true;
  }
  play() {
    this.paused = false;
    return Promise.resolve();
  }
}

const times = mediaTimes(
  Array.from({ length: 60 }, (_, i) => i * 1001),
  { num: 1, den: 30000 },
  0,
);
let video: FakeVideo;
let states: SeekerState[];
let seeker: FrameSeeker;

beforeEach(() => {
  vi.useFakeTimers();
  video = new FakeVideo(times);
  states = [];
  seeker = new FrameSeeker(video as unknown as HTMLVideoElement, times, (s) => states.push(s));
});
afterEach(() => {
  seeker.dispose();
  vi.useRealTimers();
});

describe("frame seeker", () => {
  it("seeks to the middle of the frame and confirms it when the painted frame starts at the frame's time", async () => {
    seeker.seek(10);
    expect(seeker.current).toEqual({ status: "seeking", frame: null, target: 10 });
    await vi.advanceTimersByTimeAsync(25);
    expect(video.seeks).toEqual([times[10] + (times[11] - times[10]) / 2]);
    expect(seeker.current).toEqual({ status: "confirmed", frame: 10, target: 10 });
  });

  it("follows a play it did not start (the browser's media keys): the frame is no longer confirmed", async () => {
    seeker.seek(10);
    await vi.advanceTimersByTimeAsync(25);
    expect(seeker.current.status).toBe("confirmed");
    video.paused = false;
    video.dispatchEvent(new Event("play"));
    expect(seeker.current).toEqual({ status: "playing", frame: null, target: 10 });
  });

  it("says unconfirmed when the browser paints another frame", async () => {
    video.paint = () => times[11];
    seeker.seek(10);
    await vi.advanceTimersByTimeAsync(400);
    expect(seeker.current).toEqual({ status: "unconfirmed", frame: null, target: 10 });
  });

  it("says unconfirmed when the painted time is no frame's start", async () => {
    video.paint = (t) => t;
    seeker.seek(10);
    // Painted before `seeked` and wrong: a later frame gets a quarter of a second to arrive.
    await vi.advanceTimersByTimeAsync(300);
    expect(seeker.current.status).toBe("unconfirmed");
  });

  it("says unconfirmed when nothing is painted after the seek", async () => {
    video.paint = () => null;
    seeker.seek(10);
    await vi.advanceTimersByTimeAsync(500);
    expect(seeker.current.status).toBe("seeking");
    await vi.advanceTimersByTimeAsync(600);
    expect(seeker.current.status).toBe("unconfirmed");
  });

  it("keeps only the latest request while a seek is under way", async () => {
    seeker.seek(1);
    seeker.seek(2);
    seeker.seek(3);
    seeker.seek(4);
    await vi.advanceTimersByTimeAsync(100);
    expect(video.seeks.length).toBe(2);
    expect(seeker.current).toEqual({ status: "confirmed", frame: 4, target: 4 });
    // The superseded frame 1 was never reported as confirmed.
    expect(states.filter((s) => s.status === "confirmed").map((s) => s.frame)).toEqual([4]);
  });

  it("does not seek again to the frame already proven on screen (the browser would paint nothing)", async () => {
    seeker.seek(5);
    await vi.advanceTimersByTimeAsync(25);
    seeker.seek(5);
    await vi.advanceTimersByTimeAsync(25);
    expect(video.seeks.length).toBe(1);
    expect(seeker.current).toEqual({ status: "confirmed", frame: 5, target: 5 });
  });

  it("clamps requests to the clip", async () => {
    seeker.seek(500);
    await vi.advanceTimersByTimeAsync(25);
    expect(seeker.current.frame).toBe(59);
    seeker.seek(-3);
    await vi.advanceTimersByTimeAsync(25);
    expect(seeker.current.frame).toBe(0);
  });
});
