import { z } from "zod";
import { editionInputSchema } from "@/lib/editions/schema";
import type { EditionJson } from "@/lib/editions/hooks";
import { EDITION_VALUES } from "./edition-fields";

// The API's own schema, except that round sizes are typed as one list ("2, 8, 24").
const api = editionInputSchema.shape;

export const editionFormSchema = z
  .object({
    ...api,
    roundSizes: z
      .string()
      .transform((s): (string | number)[] => s.split(/[,;\s]+/).filter(Boolean))
      .pipe(api.roundSizes),
  })
  .refine((e) => e.surfaceTempMinC < e.surfaceTempMaxC, { path: ["surfaceTempMaxC"], message: "The highest surface temperature must be above the lowest." });

export type EditionFormInput = z.input<typeof editionFormSchema>;
export type EditionFormOutput = z.output<typeof editionFormSchema>;

/** A server path as the form names it: any round-size error belongs to the one list input. */
export const editionFormPath = (path: string) => (path.startsWith("roundSizes") ? "roundSizes" : path);

export function editionDefaults(from: EditionJson | undefined, mode: "new" | "edit"): EditionFormInput {
  const str = (v: number | undefined) => (v === undefined ? "" : String(v));
  const sources = Object.fromEntries(EDITION_VALUES.map((m) => [m.key, from?.sources[m.key] ?? ""]));
  return {
    // A new edition needs its own name and date; a correction keeps them.
    name: mode === "edit" ? (from?.name ?? "") : "",
    effectiveFrom: mode === "edit" ? (from?.effectiveFrom ?? "") : "",
    minAbsorptionS: str(from?.minAbsorptionS),
    criterion: from?.criterion ?? "ball_mean",
    belowMinimumRule: from?.belowMinimumRule ?? "fails",
    dropsPerBall: str(from?.dropsPerBall),
    guardBandS: str(from?.guardBandS),
    roundSizes: from?.roundSizes.join(", ") ?? "",
    toleranceCoverage: str(from?.toleranceCoverage),
    toleranceConfidence: str(from?.toleranceConfidence),
    readingToleranceS: str(from?.readingToleranceS),
    minAcclimationH: str(from?.minAcclimationH),
    surfaceTempMinC: str(from?.surfaceTempMinC),
    surfaceTempMaxC: str(from?.surfaceTempMaxC),
    roughnessMaxSdUm: str(from?.roughnessMaxSdUm),
    sources,
    notes: from?.notes ?? "",
    basedOnId: mode === "new" ? (from?.id ?? null) : (from?.basedOnId ?? null),
  };
}
