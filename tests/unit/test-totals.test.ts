import { describe, expect, it } from "vitest";
import { totalsLine, totalsOf } from "../../scripts/test-totals";

// The one line CI reads: a red run must never print "0 failed".
describe("the test totals line", () => {
  const file = (status: string, ...tests: string[]) => ({ status, assertionResults: tests.map((s) => ({ status: s })) });
  const none = { skipped: 0, todo: 0 };

  it("adds the failed tests of every file", () => {
    expect(
      totalsOf({ numPassedTests: 3, numFailedTests: 1, testResults: [file("passed", "passed", "passed"), file("failed", "passed", "failed")] }, 1),
    ).toEqual({ passed: 3, failed: 1, ...none });
  });

  it("counts a file that did not load as one failure", () => {
    expect(totalsOf({ numPassedTests: 2, numFailedTests: 0, testResults: [file("passed", "passed", "passed"), file("failed")] }, 1)).toEqual({
      passed: 2,
      failed: 1,
      ...none,
    });
  });

  it("counts a file whose beforeAll threw, its tests skipped, as one failure", () => {
    expect(totalsOf({ numPassedTests: 0, numFailedTests: 0, numPendingTests: 2, testResults: [file("failed", "skipped", "skipped")] }, 1)).toEqual({
      passed: 0,
      failed: 1,
      skipped: 2,
      todo: 0,
    });
  });

  // What vitest 4 writes in each case (checked by running it): every test passed but vitest exits 1.
  it("counts a passing run that left an unhandled rejection (vitest exits 1, report says success) as one failure", () => {
    expect(totalsOf({ numPassedTests: 1, numFailedTests: 0, success: true, testResults: [file("passed", "passed")] }, 1)).toEqual({
      passed: 1,
      failed: 1,
      ...none,
    });
  });

  it("counts a run with no matching test file as one failure", () => {
    expect(totalsOf({ numPassedTests: 0, numFailedTests: 0, success: false, testResults: [] }, 1)).toEqual({ passed: 0, failed: 1, ...none });
  });

  it("counts a filter that matched no test (every test skipped, vitest exits 0) as one failure", () => {
    expect(
      totalsOf({ numPassedTests: 0, numFailedTests: 0, numPendingTests: 9, success: true, testResults: [file("passed", "skipped", "skipped")] }, 0),
    ).toEqual({ passed: 0, failed: 1, skipped: 9, todo: 0 });
  });

  it("says 0 failed only for a green run, with its skipped and todo tests", () => {
    const t = totalsOf(
      {
        numPassedTests: 850,
        numFailedTests: 0,
        numPendingTests: 2,
        numTodoTests: 1,
        success: true,
        testResults: [file("passed", "passed", "skipped", "todo")],
      },
      0,
    );
    expect(t).toEqual({ passed: 850, failed: 0, skipped: 2, todo: 1 });
    expect(totalsLine(t)).toBe("tests: 850 passed, 0 failed, 2 skipped, 1 todo");
    expect(totalsLine(t)).toMatch(/^tests: \d+ passed, \d+ failed\b/);
  });
});
