import { z } from "zod";

export const startUploadSchema = z.object({
  fileName: z.string({ error: "The file name is required." }).trim().min(1, "The file name is required.").max(255, "The file name must be at most 255 characters."),
  size: z.number({ error: "The file size is required." }).int("The file size is a whole number of bytes.").min(0, "The file size cannot be negative."),
  contentType: z.string().max(100).default(""),
});

export const signPartsSchema = z.object({
  partNumbers: z.array(z.number().int().min(1).max(10_000), { error: "Give the part numbers to sign." }).min(1).max(100, "Sign at most 100 parts at once."),
});

export const recordPartSchema = z.object({
  etag: z.string({ error: "The part's ETag is required." }).min(1, "The part's ETag is required.").max(200),
  size: z.number().int().min(0),
});
