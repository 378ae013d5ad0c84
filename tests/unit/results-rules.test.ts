import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { ballResult, submissionResults, type BallInput, type ResultLimits } from "@/lib/results/rules";
import { toleranceJudgement } from "@/lib/results/decision";
import { digitsAgainst, signed } from "@/lib/numbers";
import { pct, secsAgainst } from "@/lib/results/words";
import { toleranceFactor } from "@/lib/stats";

// The staged decision, branch by branch, on an example edition: 135 s minimum, 10 s guard band,
// rounds of 2, 8 and 24, 90 % coverage at 95 % confidence. Every value here is an example.
// These use the edition rule under which a ball below the minimum is reported while the rounds and
// the tolerance limit decide; the default rule (the ball fails the submission) has its own tests.
const LIMITS: ResultLimits = {
  minAbsorptionS: 135,
  criterion: "ball_mean",
  belowMinimumRule: "reported",
  dropsPerBall: 3,
  guardBandS: 10,
  roundSizes: [2, 8, 24],
  toleranceCoverage: 0.9,
  toleranceConfidence: 0.95,
};

let seq = 0;
function ball(serial: string, round: number, times: (number | null)[], run: BallInput["run"] = { id: `run-${serial}`, needsAcceptance: false }): BallInput {
  return {
    sampleId: `s-${serial}`,
    serial,
    round,
    weightG: 6800,
    run,
    drops: times.map((t, i) => ({ id: `d${++seq}`, ordinal: i + 1, settled: t !== null, timeS: t, uncertaintyS: 0.08, readers: ["A", "B"] })),
  };
}
/** A ball whose three drops average `mean` exactly. */
const at = (serial: string, round: number, mean: number) => ball(serial, round, [mean - 0.4, mean, mean + 0.4]);

describe("ball results", () => {
  it("gives n, mean, SD and range of the drop times", () => {
    const b = ballResult(ball("A", 1, [150, 152, 154]), LIMITS);
    expect(b).toMatchObject({ n: 3, mean: 152, sd: 2, min: 150, max: 154, range: 4, value: 152, status: "meets" });
  });

  it("sits below, close or clear by the ball mean, the guard band's edges included", () => {
    expect(ballResult(at("A", 1, 134.9), LIMITS).status).toBe("below");
    expect(ballResult(at("A", 1, 135), LIMITS).status).toBe("close");
    expect(ballResult(at("A", 1, 144.9), LIMITS).status).toBe("close");
    expect(ballResult(at("A", 1, 145), LIMITS).status).toBe("meets");
  });

  it("judges the shortest drop under the every-drop criterion", () => {
    const input = ball("A", 1, [150, 150, 133]);
    expect(ballResult(input, LIMITS)).toMatchObject({ value: (150 + 150 + 133) / 3, status: "close" });
    expect(ballResult(input, { ...LIMITS, criterion: "every_drop" })).toMatchObject({ value: 133, status: "below" });
  });

  it("flags an outlying drop by Dixon's Q and keeps it in the mean", () => {
    // r10 = (158.9 − 146.2)/(158.9 − 146.0) = 0.9845 > 0.970, the 95 % critical value for n = 3,
    // Rorabacher (1991), Analytical Chemistry 63(2).
    const b = ballResult(ball("A", 1, [146.0, 146.2, 158.9]), LIMITS);
    expect(b.dixon?.q).toBeCloseTo(12.7 / 12.9, 10);
    expect(b.dixon?.critical).toBe(0.97);
    expect(b.drops.map((d) => d.outlier)).toEqual([false, false, true]);
    expect(b.mean).toBeCloseTo((146.0 + 146.2 + 158.9) / 3, 10);
    // 0.9690 stays under the same critical value: not flagged.
    const near = ballResult(ball("B", 1, [146.0, 146.4, 158.9]), LIMITS);
    expect(near.dixon?.q).toBeCloseTo(12.5 / 12.9, 10);
    expect(near.drops.some((d) => d.outlier)).toBe(false);
  });

  it("waits for untested balls, unaccepted runs and unsettled drops", () => {
    expect(ballResult(ball("A", 1, [], null), LIMITS)).toMatchObject({ status: "pending", pendingReason: "not tested yet" });
    expect(ballResult(ball("A", 1, [150, 150, 150], { id: "r", needsAcceptance: true }), LIMITS).pendingReason).toMatch(/lead to accept/);
    expect(ballResult(ball("A", 1, [150, null, 150]), LIMITS)).toMatchObject({ status: "pending", pendingReason: "2 of 3 drops settled", mean: null });
  });
});

describe("words", () => {
  it("says a tiny fraction is small rather than none", () => {
    expect(pct(0.0000042, 2)).toBe("less than 0.01 %");
    expect(pct(0, 2)).toBe("0 %");
    expect(pct(0.0264, 2)).toBe("2.64 %");
    expect(pct(0.95)).toBe("95 %");
  });

  it("shows a limit with more decimals only when one decimal would round it onto the minimum", () => {
    expect(secsAgainst(138.26, 135)).toBe("138.3 s");
    expect(secsAgainst(134.96, 135)).toBe("134.96 s");
    expect(secsAgainst(134.996, 135)).toBe("134.996 s");
  });

  it("keeps a value on its own side of every threshold given, and writes negatives with a true minus", () => {
    expect(digitsAgainst(144.96, [135, 145])).toBe(2);
    expect(digitsAgainst(135.04, [135, 145])).toBe(2);
    expect(digitsAgainst(135, [135, 145])).toBe(1);
    expect(secsAgainst(134.9999, [135, 145], 3)).toBe("134.9999 s");
    expect(signed(-0.25, 2)).toBe("\u22120.25");
    expect(signed(-0.0001, 2)).toBe("0.00");
    expect(signed(1.5, 1)).toBe("1.5");
  });
  it("keeps any value on its side of the minimum, rounded (property)", () => {
    fc.assert(
      fc.property(fc.double({ min: 100, max: 200, noNaN: true }), fc.double({ min: 100, max: 200, noNaN: true }), (v, limit) => {
        const L = Number(limit.toFixed(2));
        const shown = Number(secsAgainst(v, L).replace(" s", ""));
        expect(Math.sign(shown - L)).toBe(Math.sign(v - L));
      }),
      { numRuns: 300 },
    );
  });
});

describe("the staged submission decision", () => {
  it("all clear after round 1: meets the limit", () => {
    const { decision } = submissionResults(LIMITS, [at("A", 1, 150), at("B", 1, 152)], 1);
    expect(decision).toMatchObject({ decision: "meets limit", decidedBy: "every ball clear", nextRound: null });
    expect(decision.explanation).toBe("2 balls; every ball mean is at least 145.0 s, clear of the 135 s minimum and its 10 s guard band (lowest: A, 150.0 s).");
  });

  it("one ball below after round 1: reported at once, and testing goes on with round 2", () => {
    const { decision } = submissionResults(LIMITS, [at("A", 1, 150), at("B", 1, 131.2)], 1);
    expect(decision).toMatchObject({ decision: "close to limit — more samples", belowBalls: ["B"], nextRound: { round: 2, size: 8 } });
    expect(decision.explanation).toContain("B (131.2 s) is below the 135 s minimum: tell the manufacturer now; testing goes on.");
  });

  it("one ball in the guard band after round 1 asks for round 2 of 8", () => {
    const { decision } = submissionResults(LIMITS, [at("A", 1, 150), at("B", 1, 141.2)], 1);
    expect(decision).toMatchObject({ decision: "close to limit — more samples", closeBalls: ["B"], nextRound: { round: 2, size: 8 } });
    expect(decision.explanation).toBe(
      "After round 1: 1 of 2 balls is close to the 135 s minimum, inside its 10 s guard band: B (141.2 s). Round 2 asks for 8 more samples.",
    );
    expect(decision.nextAction).toBe("Request round 2: 8 more samples from the manufacturer.");
  });

  it("a ball in the guard band after round 2 asks for round 3 of 24", () => {
    const balls = [at("A", 1, 150), at("B", 1, 141.2), ...Array.from({ length: 8 }, (_, i) => at(`C${i}`, 2, 146 + i))];
    expect(submissionResults(LIMITS, balls, 2).decision.nextRound).toEqual({ round: 3, size: 24 });
  });

  it("waits while a ball of the round has no result or samples are missing, and still reports a ball below", () => {
    const d = submissionResults(LIMITS, [at("A", 1, 131), ball("B", 1, [150, null, 150])], 1).decision;
    expect(d).toMatchObject({ decision: "pending", pendingBalls: ["B"], belowBalls: ["A"] });
    expect(d.explanation).toBe(
      "Round 1: 1 of 2 balls have results. Waiting: B (2 of 3 drops settled). A (131.0 s) is below the 135 s minimum: tell the manufacturer now; testing goes on.",
    );
    const short = submissionResults(LIMITS, [at("A", 1, 150), at("B", 1, 150), at("C", 2, 150)], 2).decision;
    expect(short).toMatchObject({ decision: "pending" });
    expect(short.explanation).toContain("7 samples of round 2 not received");
  });

  // Final rounds on an edition of two rounds (2 + 8 = 10 balls), so the factor is a tabulated one:
  // k = 2.355 for n = 10, p = 0.90, γ = 0.95 (Montgomery & Runger, table of one-sided tolerance factors).
  const TWO_ROUNDS = { ...LIMITS, roundSizes: [2, 8] };
  const tenBalls = (means: number[]) => means.map((m, i) => at(`B${i}`, i < 2 ? 1 : 2, m));

  it("final judgement passes when the lower tolerance limit is above the minimum", () => {
    const means = [141, 142, 143, 145, 146, 146, 147, 149, 150, 151];
    const { decision } = submissionResults(TWO_ROUNDS, tenBalls(means), 2);
    const t = decision.tolerance!;
    expect(t.k).toBeCloseTo(2.355, 3);
    expect(t.mean).toBeCloseTo(146, 10);
    expect(t.limit).toBeCloseTo(146 - t.k * t.sd, 10);
    expect(decision).toMatchObject({ decision: "meets limit", decidedBy: "tolerance limit", finalRound: true });
    expect(decision.explanation).toMatch(
      /^10 balls; lower 90 %\/95 % tolerance limit 13\d\.\d s is at or above the 135 s minimum; estimated fraction of balls below the minimum (\d+(\.\d+)?|less than 0\.01) %\.$/,
    );
  });

  it("final judgement fails when the lower tolerance limit is below the minimum", () => {
    const { decision } = submissionResults(TWO_ROUNDS, tenBalls([136, 138, 140, 146, 150, 152, 155, 158, 160, 165]), 2);
    expect(decision.tolerance!.limit).toBeLessThan(135);
    expect(decision).toMatchObject({ decision: "below limit", decidedBy: "tolerance limit" });
    expect(decision.explanation).toContain("is below the 135 s minimum");
  });

  it("names a ball below the minimum in the final decision too, even when the tolerance limit holds", () => {
    // 34 balls over rounds 2, 8 and 24, judged on every drop; one ball's shortest drop is 134.0 s.
    const every = { ...LIMITS, criterion: "every_drop" as const };
    const balls = Array.from({ length: 34 }, (_, i) => at(`F${i}`, i < 2 ? 1 : i < 10 ? 2 : 3, 170 + (i % 7)));
    balls[5] = ball("LOW", 2, [134.0, 170, 171]);
    const { decision } = submissionResults(every, balls, 3);
    expect(decision).toMatchObject({ decision: "meets limit", decidedBy: "tolerance limit", finalRound: true, belowBalls: ["LOW"] });
    expect(decision.explanation).toContain("LOW (134.0 s) is below the 135 s minimum");
    expect(decision.belowNote).toBe(
      "LOW (134.0 s) is below the 135 s minimum: the manufacturer is told; under this edition the tolerance limit of every ball decides.",
    );
    expect(decision.explanation).not.toContain("testing goes on");
    // Under the default rule the same ball fails the submission on its own.
    const fails = submissionResults({ ...every, belowMinimumRule: "fails" }, balls, 3).decision;
    expect(fails).toMatchObject({ decision: "below limit", decidedBy: "ball below the minimum", belowBalls: ["LOW"], nextRound: null });
    expect(fails.explanation).toBe(
      "Round 3: LOW (134.0 s) is below the 135 s minimum: under this edition a ball below the minimum fails the submission on its own.",
    );
  });

  it("under the default rule a ball below the minimum fails the submission in any round, even before the others have results", () => {
    const FAILS = { ...LIMITS, belowMinimumRule: "fails" as const };
    const d = submissionResults(FAILS, [at("A", 1, 150), at("B", 1, 131.2)], 1).decision;
    expect(d).toMatchObject({ decision: "below limit", decidedBy: "ball below the minimum", nextRound: null, belowBalls: ["B"] });
    const early = submissionResults(FAILS, [at("A", 1, 131), ball("B", 1, [150, null, 150])], 1).decision;
    expect(early).toMatchObject({ decision: "below limit", pendingBalls: ["B"] });
    expect(early.explanation).toContain("Still without a result: B (2 of 3 drops settled).");
    expect(early.nextAction).toContain("finish the round's readings");
  });

  it("never rounds a judged value onto or across the minimum or the guard band's top", () => {
    const d = submissionResults(LIMITS, [at("A", 1, 150), at("B", 1, 134.96)], 1).decision;
    expect(d.explanation).toContain("B (134.96 s) is below the 135 s minimum");
    const close = submissionResults(LIMITS, [at("A", 1, 150), at("B", 1, 144.96)], 1).decision;
    expect(close.explanation).toContain("B (144.96 s)");
    const clear = submissionResults(LIMITS, [at("A", 1, 150), at("B", 1, 145.0001)], 1).decision;
    expect(clear.explanation).toContain("(lowest: B, 145.0001 s)");
  });

  it("a tolerance limit that cannot be computed leaves the decision pending, in words, and never throws", () => {
    // A coverage of 1 has no normal quantile: the statistic fails, the results still come.
    const broken = { ...TWO_ROUNDS, toleranceCoverage: 1 };
    const { decision } = submissionResults(broken, tenBalls([141, 142, 143, 145, 146, 146, 147, 149, 150, 151]), 2);
    expect(decision).toMatchObject({ decision: "pending", tolerance: null });
    expect(decision.explanation).toMatch(/^10 balls: The lower tolerance limit of 10 balls could not be computed \(.+\)\.$/);
  });

  it("judges 300 balls at 99 % coverage (a factor beyond where the old series stopped)", () => {
    const many = { ...LIMITS, roundSizes: [2, 298], toleranceCoverage: 0.99 };
    const balls = Array.from({ length: 300 }, (_, i) => at(`M${i}`, i < 2 ? 1 : 2, 150 + (i % 10)));
    const { decision } = submissionResults(many, balls, 2);
    expect(decision.tolerance!.k).toBeCloseTo(2.5219, 4); // SciPy 1.17 scipy.stats.nct (see stats-tolerance.test.ts)
    expect(decision.decision).toBe("meets limit");
  });

  it("an edition of one round of one ball is judged by that ball", () => {
    const one = { ...LIMITS, roundSizes: [1] };
    expect(submissionResults(one, [at("A", 1, 140)], 1).decision).toMatchObject({ decision: "meets limit", decidedBy: "single ball" });
    expect(submissionResults(one, [at("A", 1, 130)], 1).decision).toMatchObject({ decision: "below limit", decidedBy: "single ball" });
  });

  it("meets once every round is in exactly when every ball is clear or the tolerance limit holds (property)", () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: 125, max: 175, noNaN: true }), { minLength: 10, maxLength: 10 }), (means) => {
        const { decision } = submissionResults(TWO_ROUNDS, tenBalls(means), 2);
        const clear = means.every((m) => m >= 145);
        const ltl = decision.tolerance!.limit;
        expect(decision.decision === "meets limit").toBe(clear || ltl >= 135);
        expect(decision.tolerance!.k).toBeCloseTo(toleranceFactor(10, 0.9, 0.95), 12);
      }),
      { numRuns: 50 },
    );
  });
});

describe("the tolerance judgement of identical ball values (SD 0)", () => {
  // Arithmetic: with no spread the fraction below is 1 when the common value is below the minimum,
  // 0 above it, and taken as one half exactly at it; the lower limit is the common value itself.
  const below = (x: number) => x - Math.abs(x) * Number.EPSILON; // the nearest double below x, or next to it
  it("every ball below the minimum: 100 % below and the limit fails, whatever the float noise of the mean", () => {
    // 38 balls of 999.999999999999 s against 999.9999999999991 s: summed, the mean lands at or above
    // the minimum, which once read as "0 %" below.
    const t = toleranceJudgement(Array(38).fill(999.999999999999), { ...LIMITS, minAbsorptionS: 999.9999999999991 })!;
    expect(t).toMatchObject({ sd: 0, mean: 999.999999999999, limit: 999.999999999999, fractionBelow: 1, cpl: null, passes: false });
    for (const n of [2, 3, 5, 10, 34]) {
      const v = below(1.9);
      expect(v).toBeLessThan(1.9);
      expect(toleranceJudgement(Array(n).fill(v), { ...LIMITS, minAbsorptionS: 1.9 }), `n = ${n}`).toMatchObject({ fractionBelow: 1, passes: false, sd: 0 });
    }
  });

  it("every ball exactly at the minimum: the limit holds and half is taken as below", () => {
    // Three balls at 1.9 s: the computed mean is 1.8999999999999997 with an SD of 3e-16.
    const t = toleranceJudgement([1.9, 1.9, 1.9], { ...LIMITS, minAbsorptionS: 1.9 })!;
    expect(t).toMatchObject({ mean: 1.9, sd: 0, limit: 1.9, fractionBelow: 0.5, passes: true });
  });

  it("identical values of any size and count: the fraction and the verdict follow the value's side of the minimum (property)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.01, max: 1000, noNaN: true }),
        fc.double({ min: 0.01, max: 1000, noNaN: true }),
        fc.integer({ min: 2, max: 40 }),
        (v, L, n) => {
          const t = toleranceJudgement(Array(n).fill(v), { ...LIMITS, minAbsorptionS: L })!;
          expect(t.fractionBelow).toBe(v < L ? 1 : v > L ? 0 : 0.5);
          expect(t.passes).toBe(v >= L);
        },
      ),
      {
        numRuns: 3000,
        examples: [
          [999.999999999999, 999.9999999999991, 38],
          [1.9, 1.9, 3],
        ],
      },
    );
  });

  it("says 100 % below in the final decision's words when every ball has the same value below the minimum", () => {
    const balls = Array.from({ length: 10 }, (_, i) => ball(`S${i}`, i < 2 ? 1 : 2, [131.2, 131.2, 131.2]));
    const { decision } = submissionResults({ ...LIMITS, roundSizes: [2, 8] }, balls, 2);
    expect(decision).toMatchObject({ decision: "below limit", decidedBy: "tolerance limit" });
    expect(decision.explanation).toContain("estimated fraction of balls below the minimum 100 %.");
  });
});
