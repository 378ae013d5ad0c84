import { z } from "zod";
import { isoInstant, num, optionalText, temperatureSchema, text } from "../schema-parts";

export const runInputSchema = z.object({
  testedAt: isoInstant("Tested at"),
  roomTemp: temperatureSchema("Room temperature"),
  surfaceTemp: temperatureSchema("Surface temperature"),
  prepMethod: text("Surface preparation method", 500),
  prepAbrasive: optionalText("Abrasive", 120),
  prepPadPosition: optionalText("Pad cycle position", 120),
  prepNotes: optionalText("Preparation notes", 1000),
  roughnessRaUm: z
    .array(num("Roughness reading").refine((v) => v >= 0 && v < 100, "A roughness reading (Ra) must be between 0 and 100 µm."))
    .max(30, "At most 30 roughness readings.")
    .default([]),
  oilLot: text("Oil lot", 60),
  dispenserCheck: z
    .object({
      value: num("Dispenser check").refine((v) => v > 0, "The dispenser check must be more than zero."),
      unit: z.enum(["mg", "uL"], { error: "Choose mg or µL." }),
    })
    .nullish(),
  cameraId: optionalText("Camera", 60),
  notes: optionalText("Notes", 2000),
});
export type RunInput = z.input<typeof runInputSchema>;
export type RunValues = z.output<typeof runInputSchema>;

const reason = () => text("Reason", 1000).refine((v) => v.length >= 10, "Write the reason in a sentence (at least 10 characters).");

export const runAcceptanceSchema = z.object({ reason: reason() });

/** A lead voids a run that must not count; the reason is kept with the run. */
export const runVoidSchema = z.object({ reason: reason() });
