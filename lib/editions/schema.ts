import { z } from "zod";
import { isoDate, num, optionalText, text } from "../schema-parts";

export const CRITERIA = ["ball_mean", "every_drop"] as const;
export type Criterion = (typeof CRITERIA)[number];
export const CRITERION_LABELS: Record<Criterion, string> = { ball_mean: "ball mean", every_drop: "every drop" };

/** What a ball below the minimum does to the submission: fail it on its own, or be reported while the rounds decide. */
export const BELOW_MINIMUM_RULES = ["fails", "reported"] as const;
export type BelowMinimumRule = (typeof BELOW_MINIMUM_RULES)[number];
export const BELOW_MINIMUM_RULE_LABELS: Record<BelowMinimumRule, string> = {
  fails: "fails the submission on its own",
  reported: "is reported; the rounds and the tolerance limit decide",
};

const probability = (label: string) => num(label).refine((v) => v > 0 && v < 1, `${label} must be between 0 and 1, e.g. 0.95.`);
const nonNegative = (label: string) => num(label).refine((v) => v >= 0, `${label} cannot be negative.`);

/** The fields of an edition whose value and source a lab sets. */
export const EDITION_FIELDS = [
  "minAbsorptionS",
  "criterion",
  "belowMinimumRule",
  "dropsPerBall",
  "guardBandS",
  "roundSizes",
  "toleranceCoverage",
  "toleranceConfidence",
  "readingToleranceS",
  "minAcclimationH",
  "surfaceTempMinC",
  "surfaceTempMaxC",
  "roughnessMaxSdUm",
] as const;

export const editionInputSchema = z
  .object({
    name: text("Name", 120),
    effectiveFrom: isoDate("Effective date"),
    minAbsorptionS: num("Minimum absorption time").refine((v) => v > 0, "Minimum absorption time must be more than zero."),
    criterion: z.enum(CRITERIA, { error: "Choose ball mean or every drop." }),
    belowMinimumRule: z.enum(BELOW_MINIMUM_RULES, { error: "Choose whether a ball below the minimum fails the submission on its own." }).default("fails"),
    dropsPerBall: num("Drops per ball").pipe(
      z.number().int("Drops per ball must be a whole number.").min(1, "At least one drop per ball.").max(10, "At most 10 drops per ball."),
    ),
    guardBandS: nonNegative("Guard band"),
    roundSizes: z
      .array(num("Round size").pipe(z.number().int("Round sizes are whole numbers.").min(1, "A round has at least one sample.")), {
        error: "Round sizes are required.",
      })
      .min(1, "Give at least one round size.")
      .max(10, "At most 10 rounds."),
    toleranceCoverage: probability("Tolerance coverage"),
    toleranceConfidence: probability("Tolerance confidence"),
    readingToleranceS: nonNegative("Reading agreement tolerance"),
    minAcclimationH: nonNegative("Minimum acclimation"),
    surfaceTempMinC: num("Lowest surface temperature"),
    surfaceTempMaxC: num("Highest surface temperature"),
    roughnessMaxSdUm: nonNegative("Largest roughness spread"),
    sources: z.partialRecord(z.enum(EDITION_FIELDS), z.string().max(500, "A source note must be at most 500 characters.")).default({}),
    notes: optionalText("Notes"),
    basedOnId: z.uuid().nullish(),
  })
  .refine((e) => !(Number.isFinite(e.surfaceTempMinC) && Number.isFinite(e.surfaceTempMaxC)) || e.surfaceTempMinC < e.surfaceTempMaxC, {
    path: ["surfaceTempMaxC"],
    message: "The highest surface temperature must be above the lowest.",
  });
export type EditionInput = z.input<typeof editionInputSchema>;
export type EditionValues = z.output<typeof editionInputSchema>;
