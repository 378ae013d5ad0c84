import { z } from "zod";
import { isoDate, num, optionalText, text } from "../schema-parts";

export const sampleRequestInputSchema = z.object({
  count: num("Number of samples").pipe(
    z.number().int("The number of samples is a whole number.").min(1, "Ask for at least one sample.").max(1000, "Ask for at most 1000 samples."),
  ),
  weight: text("Weight", 120),
  dueBy: isoDate("Due by"),
  note: optionalText("Note", 2000).default(""),
});
export type SampleRequestInput = z.infer<typeof sampleRequestInputSchema>;

export const acknowledgeInputSchema = z.object({
  shippingDetails: text("Shipping details", 2000),
  shippedOn: isoDate("Ship date").nullish(),
});
export type AcknowledgeInput = z.infer<typeof acknowledgeInputSchema>;
