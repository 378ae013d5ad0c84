import type { SampleRow } from "./queries";

export interface SampleView extends Omit<SampleRow, "receivedAt" | "acclimationStartedAt"> {
  receivedAt: string;
  acclimationStartedAt: string | null;
}

export function toSampleView(s: SampleRow): SampleView {
  return { ...s, receivedAt: s.receivedAt.toISOString(), acclimationStartedAt: s.acclimationStartedAt?.toISOString() ?? null };
}
