import { z } from "zod";
import { text } from "../schema-parts";

const frame = (label: string) =>
  z
    .number({ error: `${label} must be a frame number.` })
    .int(`${label} must be a whole frame number.`)
    .min(0, `${label} cannot be below frame 0.`)
    .max(2 ** 31 - 1, `${label} is beyond any clip.`);

/** A ruling: accept the first or the second reading, or give a third reading's two marks. */
export const rulingSchema = z
  .object({
    chosen: z.enum(["first", "second", "third"], { error: "Choose the first reading, the second, or a third reading of your own." }),
    reason: text("Reason", 2000).refine((v) => v.length >= 10, "Write the reason for the ruling in a sentence (at least 10 characters)."),
    dispenseFrame: frame("The dispense frame").optional(),
    clearFrame: frame("The clear frame").optional(),
  })
  .strict()
  .superRefine((v, ctx) => {
    if (v.chosen !== "third") return;
    if (v.dispenseFrame === undefined) ctx.addIssue({ code: "custom", path: ["dispenseFrame"], message: "Mark the dispense frame of the third reading." });
    if (v.clearFrame === undefined) ctx.addIssue({ code: "custom", path: ["clearFrame"], message: "Mark the clear frame of the third reading." });
  });
export type RulingInput = z.output<typeof rulingSchema>;
