import "server-only";
import type { Actor } from "../auth/actor";
import { db } from "../db";
import type { EditionRow } from "../editions/queries";
import { env } from "../env";
import type { SubmissionDecision } from "../results/decision";
import type { BallResult } from "../results/rules";
import { loadSubmissionResults } from "../results/service";
import { listRunsOfSubmission } from "../runs/queries";
import { countingRun } from "../runs/rules";
import { toRunView, type RunView } from "../runs/view";
import { listSamples } from "../samples/queries";
import { visibleSubmission } from "../submissions/service";
import type { SubmissionRow } from "../submissions/queries";
import { GRAMS_PER_POUND } from "../units/rules";
import { assertCanSeeReport } from "./policy";
import { listReportClips, listReportDrops, type ReportClipRow, type ReportReading } from "./queries";
import { signOffPart, type SignOffPart } from "../signoff/report-part";

// Everything the test report and the exports print, gathered once. The results come from the
// same loader as the results screen, so the report can never disagree with it.

export interface ReportSample {
  id: string;
  serial: string;
  round: number;
  weightG: number;
  weightLb: number;
  receivedAt: string;
  run: RunView | null;
}

export interface ReportDrop {
  id: string;
  runId: string;
  serial: string;
  round: number;
  ordinal: number;
  state: string;
  testedAt: string;
  clipSha256: string | null;
  /** The time base of the recording it was read on: the resolution of its times. */
  timeBase: { num: number; den: number } | null;
  readings: ReportReading[];
  timeS: number | null;
  uncertaintyS: number | null;
  outlier: boolean;
}

export interface ReportData {
  labName: string;
  generatedAt: string;
  submission: Pick<
    SubmissionRow,
    "id" | "reference" | "organisationName" | "modelName" | "kind" | "receivedOn" | "status" | "currentRound" | "approvalReference"
  >;
  edition: EditionRow;
  samples: ReportSample[];
  drops: ReportDrop[];
  balls: BallResult[];
  decision: SubmissionDecision;
  clips: ReportClipRow[];
  /** Rulings, the signature of the revision in force, the revision history and what changed. */
  signOff: SignOffPart;
}

export async function reportData(actor: Actor, submissionId: string): Promise<ReportData> {
  const s = await visibleSubmission(actor, submissionId);
  const q = db();
  const signOff = await signOffPart(q, s.id);
  assertCanSeeReport(
    actor,
    s,
    signOff.history.some((h) => h.signature),
  );
  const [results, samples, runs, marks, clips] = await Promise.all([
    loadSubmissionResults(q, s),
    listSamples(q, s.id),
    listRunsOfSubmission(q, s.id),
    listReportDrops(q, s.id),
    listReportClips(q, s.id),
  ]);
  const { edition, balls, decision } = results;
  const reportSamples = samples.map((x) => {
    const run = countingRun(runs.filter((r) => r.sampleId === x.id));
    return {
      id: x.id,
      serial: x.serial,
      round: x.round,
      weightG: x.weightG,
      weightLb: x.weightG / GRAMS_PER_POUND,
      receivedAt: x.receivedAt.toISOString(),
      run: run ? toRunView(run, x, edition) : null,
    };
  });
  const sha = new Map(clips.map((c) => [c.id, c.sha256]));
  const timeBase = new Map(clips.map((c) => [c.id, c.timeBase]));
  const drops: ReportDrop[] = balls.flatMap((b) => {
    const sample = reportSamples.find((x) => x.id === b.sampleId)!;
    return b.drops.map((d) => {
      const m = marks.find((x) => x.id === d.id);
      return {
        id: d.id,
        runId: b.runId!,
        serial: b.serial,
        round: b.round,
        ordinal: d.ordinal,
        state: m?.state ?? "unread",
        testedAt: sample.run?.testedAt ?? "",
        clipSha256: m?.clipId ? (sha.get(m.clipId) ?? null) : null,
        timeBase: m?.clipId ? (timeBase.get(m.clipId) ?? null) : null,
        readings: m?.readings ?? [],
        timeS: d.timeS,
        uncertaintyS: d.uncertaintyS,
        outlier: d.outlier,
      };
    });
  });
  return {
    labName: env().LAB_NAME,
    generatedAt: new Date().toISOString(),
    submission: {
      id: s.id,
      reference: s.reference,
      organisationName: s.organisationName,
      modelName: s.modelName,
      kind: s.kind,
      receivedOn: s.receivedOn,
      status: s.status,
      currentRound: s.currentRound,
      approvalReference: s.approvalReference,
    },
    edition,
    samples: reportSamples,
    drops,
    balls,
    decision,
    clips,
    signOff,
  };
}
