import "server-only";
import type { Actor } from "../auth/actor";
import { db, type Db } from "../db";
import { findEdition, type EditionRow } from "../editions/queries";
import { listRunsOfSubmission } from "../runs/queries";
import { countingRun } from "../runs/rules";
import { assertReleased } from "../signoff/release";
import { toRunView } from "../runs/view";
import { listSamples } from "../samples/queries";
import { visibleSubmission } from "../submissions/service";
import { findSubmission, type SubmissionRow } from "../submissions/queries";
import { listResultDrops } from "./queries";
import { SETTLED_STATES } from "../drops/states";
import { submissionResults, type BallInput, type ResultLimits } from "./rules";
import { compareWithApproval } from "./surveillance";
import { toResultsView, type ResultsView } from "./view";

// Results are computed on every request from the settled drops: nothing to go stale.

function limitsOf(e: EditionRow): ResultLimits {
  const { minAbsorptionS, criterion, belowMinimumRule, dropsPerBall, guardBandS, roundSizes, toleranceCoverage, toleranceConfidence } = e;
  return { minAbsorptionS, criterion, belowMinimumRule, dropsPerBall, guardBandS, roundSizes, toleranceCoverage, toleranceConfidence };
}

async function ballsOf(q: Db, s: SubmissionRow, edition: EditionRow): Promise<BallInput[]> {
  const [samples, runs, drops] = await Promise.all([listSamples(q, s.id), listRunsOfSubmission(q, s.id), listResultDrops(q, s.id)]);
  const settled: readonly string[] = SETTLED_STATES;
  return samples.map((x) => {
    // The ball's latest run not voided counts: a re-test replaces the run before it.
    const run = countingRun(runs.filter((r) => r.sampleId === x.id));
    const view = run ? toRunView(run, x, edition) : null;
    return {
      sampleId: x.id,
      serial: x.serial,
      round: x.round,
      weightG: x.weightG,
      run: run && view ? { id: run.id, needsAcceptance: view.needsAcceptance } : null,
      drops: drops
        .filter((d) => d.runId === run?.id)
        .map((d) => ({ id: d.id, ordinal: d.ordinal, settled: settled.includes(d.state), timeS: d.timeS, uncertaintyS: d.uncertaintyS, readers: d.readers })),
    };
  });
}

/** The shared loader: the edition and the computed results of one submission (results, report, exports). */
export async function loadSubmissionResults(q: Db, s: SubmissionRow) {
  const edition = (await findEdition(q, s.editionId))!;
  const limits = limitsOf(edition);
  return { edition, ...submissionResults(limits, await ballsOf(q, s, edition), s.currentRound) };
}

/** A submission's ball results and staged decision; for surveillance, the comparison with its approval. Staff at any time, the manufacturer once released. */
export async function getSubmissionResults(actor: Actor, id: string, q: Db = db()): Promise<ResultsView> {
  const s = await visibleSubmission(actor, id, q);
  await assertReleased(actor, s, "results", q);
  const own = await loadSubmissionResults(q, s);
  let surveillance = null;
  if (s.kind === "surveillance" && s.approvalSubmissionId) {
    const a = (await findSubmission(q, s.approvalSubmissionId))!;
    const approval = await loadSubmissionResults(q, a);
    surveillance = compareWithApproval(own.limits, own.balls, {
      submissionId: a.id,
      reference: a.reference,
      decision: approval.decision.decision,
      balls: approval.balls,
    });
  }
  return toResultsView(s, own.edition, own, surveillance);
}
