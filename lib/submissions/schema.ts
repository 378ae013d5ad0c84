import { z } from "zod";
import { isoDate, num, optionalText, text, uuid } from "../schema-parts";

export const KINDS = ["approval", "surveillance", "research"] as const;
export type SubmissionKind = (typeof KINDS)[number];
export const STATUSES = ["received", "testing", "awaiting_samples", "decided", "released"] as const;
export type SubmissionStatus = (typeof STATUSES)[number];
export const KIND_LABELS: Record<SubmissionKind, string> = { approval: "Approval", surveillance: "Surveillance", research: "Research" };

export const STATUS_LABELS: Record<SubmissionStatus, string> = {
  received: "received",
  testing: "testing",
  awaiting_samples: "awaiting samples",
  decided: "decided",
  released: "released",
};

const weightClasses = z
  .array(
    num("Weight class").pipe(
      z.number().int("Weight classes are whole pounds.").min(6, "Weight classes run from 6 to 16 lb.").max(16, "Weight classes run from 6 to 16 lb."),
    ),
  )
  .max(11)
  .default([])
  .transform((v) => [...new Set(v)].sort((a, b) => a - b));

export const submissionInputSchema = z
  .object({
    organisationId: uuid("an organisation"),
    modelName: text("Model name", 120).refine((v) => !/[<>]/.test(v), "Model name cannot contain < or >."),
    kind: z.enum(KINDS, { error: "Choose approval, surveillance or research." }),
    weightClassesLb: weightClasses,
    receivedOn: isoDate("Received date"),
    approvalSubmissionId: z.uuid("Choose the approval submission from the list.").nullish(),
    notes: optionalText("Notes"),
  })
  .refine((s) => s.kind !== "surveillance" || s.approvalSubmissionId, {
    path: ["approvalSubmissionId"],
    message: "A surveillance submission must name the approval submission of the same model.",
  });
export type SubmissionInput = z.input<typeof submissionInputSchema>;
export type SubmissionValues = z.output<typeof submissionInputSchema>;

export const submissionUpdateSchema = z
  .object({
    modelName: text("Model name", 120)
      .refine((v) => !/[<>]/.test(v), "Model name cannot contain < or >.")
      .optional(),
    weightClassesLb: weightClasses.optional(),
    notes: optionalText("Notes").optional(),
  })
  .refine((v) => Object.values(v).some((x) => x !== undefined), { message: "Nothing to change." });

export const SORTS = ["reference", "model", "organisation", "kind", "status", "round", "received"] as const;

export const submissionListSchema = z.object({
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(5).max(100).default(20),
  sort: z.enum(SORTS).default("received"),
  dir: z.enum(["asc", "desc"]).default("desc"),
  organisationId: z.uuid("Unknown organisation.").optional(),
  kind: z.enum(KINDS).optional(),
  status: z.enum(STATUSES).optional(),
  round: z.coerce.number().int().min(1).optional(),
  receivedFrom: isoDate("From date").optional(),
  receivedTo: isoDate("To date").optional(),
  q: z.string().trim().max(100).optional(),
});
export type SubmissionListQuery = z.output<typeof submissionListSchema>;
