// Which of a ball's runs counts. Pure.

/**
 * The run that counts for a ball: the last of its runs, in the order `listRunsOfSubmission` gives
 * (tested at, then recorded at, then id), that a lead has not voided. A re-test replaces the run
 * before it; voiding the re-test brings the one before it back.
 */
export function countingRun<T extends { voidedAt: Date | string | null }>(runsInOrder: T[]): T | null {
  return runsInOrder.filter((r) => !r.voidedAt).at(-1) ?? null;
}
