import type { BelowMinimumRule } from "../editions/schema";
import type { RunView } from "../runs/view";
import type { SampleView } from "../samples/view";
import type { SubmissionRow } from "./queries";

export type SubmissionView = Omit<SubmissionRow, "createdAt"> & { createdAt: string };

export function toSubmissionView(s: SubmissionRow): SubmissionView {
  return { ...s, createdAt: s.createdAt.toISOString() };
}

/** What a manufacturer sees of its own submission: status and rounds, no lab-internal detail. */
export interface ManufacturerSubmissionView {
  id: string;
  reference: string;
  modelName: string;
  kind: SubmissionRow["kind"];
  weightClassesLb: number[];
  receivedOn: string;
  editionName: string;
  status: SubmissionRow["status"];
  currentRound: number;
  samplesByRound: { round: number; count: number }[];
}

export function toManufacturerView(s: SubmissionRow, samples: { round: number }[]): ManufacturerSubmissionView {
  const counts = new Map<number, number>();
  for (const x of samples) counts.set(x.round, (counts.get(x.round) ?? 0) + 1);
  return {
    id: s.id,
    reference: s.reference,
    modelName: s.modelName,
    kind: s.kind,
    weightClassesLb: s.weightClassesLb,
    receivedOn: s.receivedOn,
    editionName: s.editionName,
    status: s.status,
    currentRound: s.currentRound,
    samplesByRound: [...counts].sort((a, b) => a[0] - b[0]).map(([round, count]) => ({ round, count })),
  };
}

export interface StaffSubmissionDetail {
  view: "staff";
  submission: SubmissionView;
  edition: {
    id: string;
    name: string;
    dropsPerBall: number;
    minAbsorptionS: number;
    belowMinimumRule: BelowMinimumRule;
    minAcclimationH: number;
    surfaceTempMinC: number;
    surfaceTempMaxC: number;
    roughnessMaxSdUm: number;
  };
  rounds: { round: number; samples: (SampleView & { runs: RunView[] })[] }[];
  flaggedRuns: number;
  /** The revision in force and whether a lead has signed it off (which locks the submission). */
  signOff: { revision: number; locked: boolean };
}
