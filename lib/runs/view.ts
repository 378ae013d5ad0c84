import type { EditionRow } from "../editions/queries";
import type { SampleRow } from "../samples/queries";
import { acclimationHours, conditionFlags, roughnessSummary, type ConditionFlag, type RoughnessSummary } from "./conditions";
import type { RunRow } from "./queries";

export interface RunView extends Omit<RunRow, "testedAt" | "acceptedAt"> {
  testedAt: string;
  acceptedAt: string | null;
  roughness: RoughnessSummary;
  acclimationH: number | null;
  flags: ConditionFlag[];
  /** Flagged and not yet accepted by a lead. */
  needsAcceptance: boolean;
}

export function toRunView(run: RunRow, sample: SampleRow, edition: EditionRow): RunView {
  const input = { testedAt: run.testedAt, acclimationStartedAt: sample.acclimationStartedAt, surfaceTempC: run.surfaceTempC, roughnessRaUm: run.roughnessRaUm };
  const flags = conditionFlags(edition, input);
  return {
    ...run,
    testedAt: run.testedAt.toISOString(),
    acceptedAt: run.acceptedAt?.toISOString() ?? null,
    roughness: roughnessSummary(run.roughnessRaUm),
    acclimationH: acclimationHours(input),
    flags,
    needsAcceptance: flags.length > 0 && !run.acceptedAt,
  };
}
