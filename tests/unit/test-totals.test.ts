import { describe, expect, it } from "vitest";
import { totalsOf } from "../../scripts/test-totals";

// The one line CI reads: a red run must never print "0 failed".
describe("the test totals line", () => {
  const file = (status: string, ...tests: string[]) => ({ status, assertionResults: tests.map((s) => ({ status: s })) });

  it("adds the failed tests of every file", () => {
    expect(totalsOf({ numPassedTests: 3, numFailedTests: 1, testResults: [file("passed", "passed", "passed"), file("failed", "passed", "failed")] })).toEqual({
      passed: 3,
      failed: 1,
    });
  });

  it("counts a file that did not load as one failure", () => {
    expect(totalsOf({ numPassedTests: 2, numFailedTests: 0, testResults: [file("passed", "passed", "passed"), file("failed")] })).toEqual({
      passed: 2,
      failed: 1,
    });
  });

  it("counts a file whose beforeAll threw, its tests skipped, as one failure", () => {
    expect(totalsOf({ numPassedTests: 0, numFailedTests: 0, testResults: [file("failed", "skipped", "skipped")] })).toEqual({ passed: 0, failed: 1 });
  });
});
