// Upload speed and time left from how many bytes have been sent over the last few seconds.
// Pure: the caller passes the clock, so it can be tested without waiting.
import { formatBytes } from "@/lib/numbers";

export interface SpeedSample {
  at: number;
  bytes: number;
}

const WINDOW_MS = 5_000;

export class SpeedMeter {
  private samples: SpeedSample[] = [];

  /** Records the total bytes sent so far. A drop (a part that failed and starts again) restarts the window. */
  add(at: number, bytes: number): void {
    const last = this.samples[this.samples.length - 1];
    if (last && bytes < last.bytes) this.samples = [];
    this.samples.push({ at, bytes });
    while (this.samples.length > 2 && at - this.samples[0].at > WINDOW_MS) this.samples.shift();
  }

  reset(): void {
    this.samples = [];
  }

  /** Bytes per second over the window, or null until there is half a second of history. */
  bytesPerSecond(): number | null {
    const first = this.samples[0];
    const last = this.samples[this.samples.length - 1];
    if (!first || !last || last.at - first.at < 500) return null;
    return ((last.bytes - first.bytes) * 1000) / (last.at - first.at);
  }

  /** Seconds until `total` at the current speed, or null when the speed is not known (or zero). */
  secondsLeft(total: number): number | null {
    const speed = this.bytesPerSecond();
    const last = this.samples[this.samples.length - 1];
    if (!speed || !last) return null;
    return Math.max(0, (total - last.bytes) / speed);
  }
}

export function formatSpeed(bytesPerSecond: number | null): string {
  if (bytesPerSecond === null) return "measuring…";
  return `${formatBytes(Math.round(bytesPerSecond))}/s`;
}

export function formatDuration(seconds: number | null): string {
  if (seconds === null) return "estimating…";
  const s = Math.round(seconds);
  if (s < 60) return `${s} s`;
  const m = Math.floor(s / 60);
  if (m < 60) return `${m} min ${String(s % 60).padStart(2, "0")} s`;
  return `${Math.floor(m / 60)} h ${String(m % 60).padStart(2, "0")} min`;
}
