// Shows exactly one frame of the index on a <video> and proves which frame the browser put on
// screen. No React here: the player's hooks drive it, tests and the benchmark read its results.
import { clampFrame, frameContaining, frameStartingAt, matchTolerance, seekTarget } from "./frame-math";

export type PlayerStatus = "loading" | "seeking" | "confirmed" | "unconfirmed" | "playing";

export interface SeekerState {
  status: PlayerStatus;
  /** The frame proven to be on screen (confirmed, or matched during playback); null otherwise. */
  frame: number | null;
  /** The frame asked for, or followed during playback: what the readout shows meanwhile. */
  target: number | null;
}

/** How long to wait for a painted frame after `seeked` before calling the picture unknown. */
const PAINT_TIMEOUT_MS = 1000;
/** A frame painted before `seeked` may be a leftover: give a later one this long to arrive. */
const LATE_FRAME_MS = 250;
/** A seek that never completes (no data, an engine fault) must not hold the queue forever. */
const SEEK_TIMEOUT_MS = 8000;

export class FrameSeeker {
  private pending: number | null = null;
  private busy = false;
  private playing = false;
  private disposed = false;
  private followHandle: number | null = null;
  /** The frame last proven on screen by a seek, whatever asked for it; null once playback moves on. */
  private onScreen: number | null = null;
  private state: SeekerState = { status: "loading", frame: null, target: null };
  private readonly tolerance: number;

  constructor(
    private readonly video: HTMLVideoElement,
    private readonly times: readonly number[],
    private readonly onState: (s: SeekerState) => void,
  ) {
    this.tolerance = matchTolerance(times);
    video.addEventListener("pause", this.onPause);
    video.addEventListener("play", this.onPlay);
  }

  get current(): SeekerState {
    return this.state;
  }

  /** Show frame i. While a seek is under way only the latest request is kept, so key repeat never piles up. */
  seek(frame: number): void {
    if (this.disposed || this.times.length === 0) return;
    const target = clampFrame(frame, this.times.length);
    this.stopFollowing();
    this.pending = target;
    this.emit({ status: "seeking", frame: null, target });
    if (!this.busy) void this.drain();
  }

  play(): void {
    if (this.disposed || this.playing) return;
    this.startPlaying();
    this.video.play().catch(() => {
      // Refused (e.g. no data yet): stay where we were, and prove it again.
      this.playing = false;
      this.seek(this.state.target ?? 0);
    });
  }

  pause(): void {
    if (this.playing) this.video.pause();
  }

  dispose(): void {
    this.disposed = true;
    this.stopFollowing();
    this.video.removeEventListener("pause", this.onPause);
    this.video.removeEventListener("play", this.onPlay);
  }

  private emit(s: SeekerState) {
    this.state = s;
    if (!this.disposed) this.onState(s);
  }

  private async drain() {
    this.busy = true;
    try {
      while (this.pending !== null && !this.disposed) {
        const target = this.pending;
        this.pending = null;
        const shown = await this.showOnce(target);
        // Playback that began meanwhile has moved the picture on.
        this.onScreen = this.playing ? null : shown;
        // A newer request or playback has taken over: this result describes nothing on screen now.
        if (this.pending !== null || this.playing) continue;
        this.emit(shown === target ? { status: "confirmed", frame: target, target } : { status: "unconfirmed", frame: null, target });
      }
    } finally {
      this.busy = false;
    }
  }

  /** One seek: register for the painted frame first, then set the time; resolves to the frame that was painted. */
  private showOnce(i: number): Promise<number | null> {
    const v = this.video;
    const t = seekTarget(this.times, i);
    // A paused element skips a seek to the time it already shows and paints nothing new: nothing to wait for.
    if (this.onScreen === i && v.paused && !v.seeking) return Promise.resolve(i);
    return new Promise((resolve) => {
      let seeked = false;
      let early: number | null | undefined;
      let handle = 0;
      let timer: ReturnType<typeof setTimeout> | undefined;
      const overall = setTimeout(() => finish(null), SEEK_TIMEOUT_MS);
      const finish = (frame: number | null) => {
        v.cancelVideoFrameCallback(handle);
        v.removeEventListener("seeked", onSeeked);
        clearTimeout(timer);
        clearTimeout(overall);
        resolve(frame);
      };
      const onFrame: VideoFrameRequestCallback = (_now, meta) => {
        const frame = frameStartingAt(this.times, meta.mediaTime, this.tolerance);
        if (seeked) return finish(frame);
        early = frame;
        handle = v.requestVideoFrameCallback(onFrame);
      };
      const onSeeked = () => {
        seeked = true;
        if (early === i) return finish(i);
        timer = setTimeout(() => finish(early ?? null), early === undefined ? PAINT_TIMEOUT_MS : LATE_FRAME_MS);
      };
      handle = v.requestVideoFrameCallback(onFrame);
      v.addEventListener("seeked", onSeeked, { once: true });
      v.currentTime = t;
    });
  }

  /** During playback every painted frame is looked up in the index. */
  private follow() {
    const onFrame: VideoFrameRequestCallback = (_now, meta) => {
      if (!this.playing) return;
      const frame = frameStartingAt(this.times, meta.mediaTime, this.tolerance);
      this.emit({ status: "playing", frame, target: frame ?? frameContaining(this.times, meta.mediaTime) });
      this.followHandle = this.video.requestVideoFrameCallback(onFrame);
    };
    this.followHandle = this.video.requestVideoFrameCallback(onFrame);
  }

  private stopFollowing() {
    if (this.followHandle !== null) this.video.cancelVideoFrameCallback(this.followHandle);
    this.followHandle = null;
    if (this.playing) {
      this.playing = false;
      this.video.pause();
    }
  }

  /** Played by something else (the browser's media keys, its own controls): follow it like our own play. */
  private onPlay = () => {
    if (!this.playing && !this.disposed) this.startPlaying();
  };

  private startPlaying() {
    this.pending = null;
    this.playing = true;
    this.onScreen = null;
    this.emit({ status: "playing", frame: null, target: this.state.target });
    this.follow();
  }

  /** Paused by anything (the end of the clip, the engine): land exactly on the frame last seen. */
  private onPause = () => {
    if (!this.playing) return;
    this.playing = false;
    this.seek(this.state.target ?? frameContaining(this.times, this.video.currentTime));
  };
}
