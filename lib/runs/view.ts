import type { EditionRow } from "../editions/queries";
import type { SampleRow } from "../samples/queries";
import { acclimationHours, conditionFlags, roughnessSummary, type ConditionFlag, type RoughnessSummary } from "./conditions";
import type { RunRow } from "./queries";

export interface RunView extends Omit<RunRow, "testedAt" | "acceptedAt" | "voidedAt" | "createdAt"> {
  testedAt: string;
  acceptedAt: string | null;
  voidedAt: string | null;
  roughness: RoughnessSummary;
  acclimationH: number | null;
  flags: ConditionFlag[];
  /** Flagged, not yet accepted by a lead, and not voided. */
  needsAcceptance: boolean;
}

export function toRunView(run: RunRow, sample: SampleRow, edition: EditionRow): RunView {
  const input = { testedAt: run.testedAt, acclimationStartedAt: sample.acclimationStartedAt, surfaceTempC: run.surfaceTempC, roughnessRaUm: run.roughnessRaUm };
  const flags = conditionFlags(edition, input);
  const { createdAt: _c, ...rest } = run;
  return {
    ...rest,
    testedAt: run.testedAt.toISOString(),
    acceptedAt: run.acceptedAt?.toISOString() ?? null,
    voidedAt: run.voidedAt?.toISOString() ?? null,
    roughness: roughnessSummary(run.roughnessRaUm),
    acclimationH: acclimationHours(input),
    flags,
    needsAcceptance: flags.length > 0 && !run.acceptedAt && !run.voidedAt,
  };
}
