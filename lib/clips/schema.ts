import { z } from "zod";

/** Seconds as typed or probed: finite, not negative, at most a day. */
const seconds = (what: string) =>
  z
    .number({ error: `${what} is required, in seconds.` })
    .finite()
    .min(0, `${what} cannot be negative.`)
    .max(86_400, `${what} must be within a day.`);

/** Where a clip trimmed in the browser came from; what was kept is read from its own frames. */
export const trimSourceSchema = z
  .object({
    sourceName: z
      .string({ error: "The original file's name is required." })
      .trim()
      .min(1, "The original file's name is required.")
      .max(255, "The original file's name must be at most 255 characters."),
    sourceStartS: seconds("The original's start time"),
    requestedStartS: seconds("The trim start"),
    requestedEndS: seconds("The trim end"),
  })
  .refine((t) => t.requestedEndS > t.requestedStartS, { message: "The trim end must come after its start.", path: ["requestedEndS"] });
export type TrimSource = z.output<typeof trimSourceSchema>;

export const startUploadSchema = z.object({
  fileName: z
    .string({ error: "The file name is required." })
    .trim()
    .min(1, "The file name is required.")
    .max(255, "The file name must be at most 255 characters."),
  size: z.number({ error: "The file size is required." }).int("The file size is a whole number of bytes.").min(0, "The file size cannot be negative."),
  contentType: z.string().max(100).default(""),
  trim: trimSourceSchema.optional(),
});

export const signPartsSchema = z.object({
  partNumbers: z.array(z.number().int().min(1).max(10_000), { error: "Give the part numbers to sign." }).min(1).max(100, "Sign at most 100 parts at once."),
});

export const recordPartSchema = z.object({
  etag: z.string({ error: "The part's ETag is required." }).min(1, "The part's ETag is required.").max(200),
  size: z.number().int().min(0),
});
