import { describe, expect, it } from "vitest";
import { THROTTLE, throttleDecision, waitInWords } from "@/lib/auth/throttle";

const now = new Date("2026-12-01T12:00:00Z");
const ago = (s: number) => new Date(now.getTime() - s * 1000);

describe("throttleDecision", () => {
  it("allows while fewer failures than the maximum fall in the window", () => {
    expect(throttleDecision([ago(10), ago(20), ago(30), ago(40)], 5, now)).toEqual({ allowed: true, retryAfterSeconds: 0 });
  });

  it("refuses at the maximum and waits until the oldest counted failure leaves the window", () => {
    const failures = [ago(10), ago(20), ago(30), ago(40), ago(100)];
    const d = throttleDecision(failures, 5, now);
    expect(d.allowed).toBe(false);
    expect(d.retryAfterSeconds).toBe(THROTTLE.windowSeconds - 100);
  });

  it("ignores failures older than the window", () => {
    const old = Array.from({ length: 10 }, (_, i) => ago(THROTTLE.windowSeconds + i + 1));
    expect(throttleDecision(old, 5, now).allowed).toBe(true);
  });

  it("counts only the newest failures for the wait, in any order", () => {
    const failures = [ago(600), ago(5), ago(4), ago(3), ago(2), ago(1)];
    expect(throttleDecision(failures, 5, now).retryAfterSeconds).toBe(THROTTLE.windowSeconds - 5);
  });
});

describe("waitInWords", () => {
  it("speaks seconds under a minute and rounds minutes up", () => {
    expect(waitInWords(1)).toBe("1 second");
    expect(waitInWords(45)).toBe("45 seconds");
    expect(waitInWords(61)).toBe("2 minutes");
    expect(waitInWords(60)).toBe("1 minute");
  });
});
