// Sign-in throttling rules: pure, so the window arithmetic is tested without a database.

export const THROTTLE = {
  windowSeconds: 15 * 60,
  maxFailuresPerAccount: 5,
  maxFailuresPerAddress: 20,
} as const;

export interface ThrottleDecision {
  allowed: boolean;
  retryAfterSeconds: number;
}

/**
 * `failures` are the times of failed attempts since the last success (any order).
 * Allowed while fewer than `max` fall inside the window; otherwise the wait lasts until the
 * oldest of the newest `max` failures leaves the window.
 */
export function throttleDecision(failures: readonly Date[], max: number, now: Date, windowSeconds = THROTTLE.windowSeconds): ThrottleDecision {
  const windowStart = now.getTime() - windowSeconds * 1000;
  const recent = failures
    .map((d) => d.getTime())
    .filter((t) => t > windowStart)
    .sort((a, b) => b - a);
  if (recent.length < max) return { allowed: true, retryAfterSeconds: 0 };
  const releaseAt = recent[max - 1] + windowSeconds * 1000;
  return { allowed: false, retryAfterSeconds: Math.max(1, Math.ceil((releaseAt - now.getTime()) / 1000)) };
}

export function waitInWords(seconds: number): string {
  if (seconds < 60) return `${seconds} second${seconds === 1 ? "" : "s"}`;
  const minutes = Math.ceil(seconds / 60);
  return `${minutes} minute${minutes === 1 ? "" : "s"}`;
}
