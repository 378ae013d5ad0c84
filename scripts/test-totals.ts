import fs from "node:fs";

type Report = { numPassedTests: number; numFailedTests: number; testResults?: { status: string; assertionResults: { status: string }[] }[] };

/**
 * Totals from vitest's JSON report; a missing report (a crash before any test) counts as one failure.
 * A file that failed with no failed test of its own (it did not load, or its beforeAll threw and its
 * tests were skipped) counts as one failure too, so the totals line never says "0 failed" for a red run.
 */
export function countResults(reportFile: string): { passed: number; failed: number } {
  if (!fs.existsSync(reportFile)) return { passed: 0, failed: 1 };
  return totalsOf(JSON.parse(fs.readFileSync(reportFile, "utf8")) as Report);
}

export function totalsOf(r: Report): { passed: number; failed: number } {
  const brokenFiles = (r.testResults ?? []).filter((f) => f.status === "failed" && !f.assertionResults.some((a) => a.status === "failed")).length;
  return { passed: r.numPassedTests, failed: r.numFailedTests + brokenFiles };
}
