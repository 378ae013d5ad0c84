import type { EditionRow } from "../editions/queries";
import type { SubmissionRow } from "../submissions/queries";
import type { SubmissionDecision } from "./decision";
import type { BallResult, ResultLimits } from "./rules";
import type { SurveillanceComparison } from "./surveillance";

/** What the results screen and API show: the submission, the edition judged against, and the results. */
export interface ResultsView {
  submission: {
    id: string;
    reference: string;
    modelName: string;
    organisationName: string;
    kind: SubmissionRow["kind"];
    currentRound: number;
    status: SubmissionRow["status"];
  };
  edition: ResultLimits & { id: string; name: string; effectiveFrom: string; sources: Record<string, string> };
  balls: BallResult[];
  decision: SubmissionDecision;
  surveillance: SurveillanceComparison | null;
}

export function toResultsView(
  s: SubmissionRow,
  e: EditionRow,
  r: { limits: ResultLimits; balls: BallResult[]; decision: SubmissionDecision },
  surveillance: SurveillanceComparison | null,
): ResultsView {
  return {
    submission: {
      id: s.id,
      reference: s.reference,
      modelName: s.modelName,
      organisationName: s.organisationName,
      kind: s.kind,
      currentRound: s.currentRound,
      status: s.status,
    },
    edition: { ...r.limits, id: e.id, name: e.name, effectiveFrom: e.effectiveFrom, sources: e.sources },
    balls: r.balls,
    decision: r.decision,
    surveillance,
  };
}
