import { z } from "zod";
import { text } from "../schema-parts";

export const signSchema = z.object({ password: z.string({ error: "Enter your password to sign." }).min(1, "Enter your password to sign.") }).strict();
export type SignInput = z.output<typeof signSchema>;

export const reopenSchema = z
  .object({ reason: text("Reason", 2000).refine((v) => v.length >= 10, "Write the reason for re-opening in a sentence (at least 10 characters).") })
  .strict();
export type ReopenInput = z.output<typeof reopenSchema>;
