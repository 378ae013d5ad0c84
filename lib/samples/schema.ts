import { z } from "zod";
import { isoInstant, massSchema, num, optionalText, text } from "../schema-parts";

const round = num("Round").pipe(z.number().int("The round is a whole number.").min(1, "Rounds start at 1."));

export const sampleInputSchema = z.object({
  serial: text("Serial number", 60),
  weight: massSchema,
  round: round.optional(),
  receivedAt: isoInstant("Received at"),
  acclimationStartedAt: isoInstant("Acclimation start").nullish(),
  notes: optionalText("Notes", 500),
});
export type SampleInput = z.input<typeof sampleInputSchema>;

export const sampleUpdateSchema = z
  .object({
    serial: text("Serial number", 60).optional(),
    weight: massSchema.optional(),
    acclimationStartedAt: isoInstant("Acclimation start").nullish(),
    notes: optionalText("Notes", 500).optional(),
  })
  .refine((v) => Object.values(v).some((x) => x !== undefined), { message: "Nothing to change." });

export const sampleImportSchema = z.object({
  csv: z.string({ error: "Paste or upload the CSV." }).min(1, "Paste or upload the CSV.").max(200_000, "The CSV is larger than 200 kB."),
  unit: z.enum(["g", "oz", "lb"], { error: "Choose the weight unit used in the file." }),
  round: round.optional(),
  receivedAt: isoInstant("Received at"),
});
