import fs from "node:fs";

type Report = {
  numPassedTests: number;
  numFailedTests: number;
  numPendingTests?: number;
  numTodoTests?: number;
  success?: boolean;
  testResults?: { status: string; assertionResults: { status: string }[] }[];
};

export interface Totals {
  passed: number;
  failed: number;
  skipped: number;
  todo: number;
}

/**
 * Totals from vitest's JSON report and vitest's exit code; a missing report (a crash before any
 * test) counts as one failure. See `totalsOf` for the rest.
 */
export function countResults(reportFile: string, exitCode: number): Totals {
  if (!fs.existsSync(reportFile)) return { passed: 0, failed: 1, skipped: 0, todo: 0 };
  return totalsOf(JSON.parse(fs.readFileSync(reportFile, "utf8")) as Report, exitCode);
}

/**
 * A file that failed with no failed test of its own (it did not load, or its beforeAll threw and its
 * tests were skipped) counts as one failure. A run that did not succeed counts as at least one
 * failure even when every test passed: vitest exits non-zero for an unhandled error outside any
 * test, or when no test file matched, and a filter that matched no test passes nothing. So the
 * totals line never says "0 failed" for a red run.
 */
export function totalsOf(r: Report, exitCode: number): Totals {
  const brokenFiles = (r.testResults ?? []).filter((f) => f.status === "failed" && !f.assertionResults.some((a) => a.status === "failed")).length;
  const failed = r.numFailedTests + brokenFiles;
  const red = exitCode !== 0 || r.success === false || r.numPassedTests === 0;
  return { passed: r.numPassedTests, failed: red ? Math.max(1, failed) : failed, skipped: r.numPendingTests ?? 0, todo: r.numTodoTests ?? 0 };
}

/** The one closing line: `tests: N passed, N failed, N skipped, N todo`. */
export function totalsLine(t: Totals): string {
  return `tests: ${t.passed} passed, ${t.failed} failed, ${t.skipped} skipped, ${t.todo} todo`;
}
