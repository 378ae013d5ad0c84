import fs from "node:fs";

/** Totals from vitest's JSON report; a missing report (a crash before any test) counts as one failure. */
export function countResults(reportFile: string): { passed: number; failed: number } {
  if (!fs.existsSync(reportFile)) return { passed: 0, failed: 1 };
  const r = JSON.parse(fs.readFileSync(reportFile, "utf8")) as { numPassedTests: number; numFailedTests: number; testResults?: { status: string; assertionResults: unknown[] }[] };
  // A file that failed to load has no assertions but still failed: count it.
  const brokenFiles = (r.testResults ?? []).filter((f) => f.status === "failed" && f.assertionResults.length === 0).length;
  return { passed: r.numPassedTests, failed: r.numFailedTests + brokenFiles };
}
