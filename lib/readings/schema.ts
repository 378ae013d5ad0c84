import { z } from "zod";
import { text, uuid } from "../schema-parts";

const frame = (label: string) =>
  z
    .number({ error: `${label} must be a frame number.` })
    .int(`${label} must be a whole frame number.`)
    .min(0, `${label} cannot be below frame 0.`)
    .max(2 ** 31 - 1, `${label} is beyond any clip.`);

export const placementSchema = z.object({
  clipId: uuid("a clip"),
  startFrame: frame("The start frame"),
});
export type PlacementInput = z.input<typeof placementSchema>;

/** A mark saves the frame the reviewer saw; null clears it. Absent keys leave a mark as it is. */
export const marksSchema = z
  .object({
    dispenseFrame: frame("The dispense frame").nullable().optional(),
    clearFrame: frame("The clear frame").nullable().optional(),
  })
  .strict();
export type MarksInput = z.input<typeof marksSchema>;

export const correctionSchema = z.object({
  reason: text("Reason", 1000).refine((v) => v.length >= 10, "Write the reason for the correction in a sentence (at least 10 characters)."),
});
