import { describe, expect, it } from "vitest";
import { ballResult, type BallInput, type ResultLimits } from "@/lib/results/rules";
import { compareWithApproval } from "@/lib/results/surveillance";
import { summarize, welchInterval } from "@/lib/stats";

// Market samples against the approval of the same model, on an example edition.
const LIMITS: ResultLimits = {
  minAbsorptionS: 135,
  criterion: "ball_mean",
  belowMinimumRule: "fails",
  dropsPerBall: 3,
  guardBandS: 10,
  roundSizes: [2, 8],
  toleranceCoverage: 0.9,
  toleranceConfidence: 0.95,
};

let seq = 0;
const ball = (serial: string, mean: number | null): BallInput => ({
  sampleId: serial,
  serial,
  round: 1,
  weightG: 7000,
  run: { id: `r-${serial}`, needsAcceptance: false },
  drops: [mean, mean, mean].map((t, i) => ({
    id: `d${++seq}`,
    ordinal: i + 1,
    settled: t !== null,
    timeS: t === null ? null : t + (i - 1) * 0.3,
    uncertaintyS: 0.07,
    readers: [],
  })),
});
const results = (means: (number | null)[]) => means.map((m, i) => ballResult(ball(`B${i}`, m), LIMITS));
const APPROVAL_MEANS = [141, 142, 143, 145, 146, 146, 147, 149, 150, 151];
const approval = { submissionId: "a", reference: "S-2026-0001", decision: "meets limit" as const, balls: results(APPROVAL_MEANS) };

describe("surveillance against the approval", () => {
  it("gives market − approval with a 95 % Welch interval, and the market's own tolerance judgement", () => {
    const market = [150, 152, 155, 149, 151];
    const c = compareWithApproval(LIMITS, results(market), approval);
    // The interval is Welch's on the balls' means (lib/stats welchInterval, checked against NIST/SEMATECH).
    const w = welchInterval(summarize(market), summarize(APPROVAL_MEANS), 0.95);
    expect(c.difference!.value).toBeCloseTo(151.4 - 146, 10);
    expect(c.difference!.lower).toBeCloseTo(w.lower, 10);
    expect(c.difference!.upper).toBeCloseTo(w.upper, 10);
    expect(c.stillMeets).toBe(true);
    expect(c.explanation).toMatch(
      /^Market samples \(5 balls\) average 151\.4 s, 5\.4 s above the approval's 146\.0 s \(95 % Welch interval [\d.]+ to [\d.]+ s\)\. Lower 90 %\/95 % tolerance limit of the market samples [\d.]+ s is at or above the 135 s minimum: the market samples still meet the limit\.$/,
    );
  });

  it("says when the market samples no longer meet the limit", () => {
    const c = compareWithApproval(LIMITS, results([136, 139, 150, 133]), approval);
    expect(c.market.tolerance!.passes).toBe(false);
    expect(c.stillMeets).toBe(false);
    expect(c.explanation).toContain("no longer meet the limit");
    expect(c.explanation).toContain("below the approval's");
  });

  it("waits for every market ball, and handles a single market ball without an interval", () => {
    expect(compareWithApproval(LIMITS, results([150, null]), approval).stillMeets).toBeNull();
    const one = compareWithApproval(LIMITS, results([140]), approval);
    expect(one.difference).toBeNull();
    expect(one.stillMeets).toBe(true);
    expect(one.explanation).toContain("needs at least 2 balls on each side");
    expect(one.explanation).toContain("With one market ball there is no tolerance limit; its ball mean 140.0 s is at or above the 135 s minimum.");
    expect(compareWithApproval(LIMITS, results([null]), approval).explanation).toContain("No market ball has a result yet");
  });
});
