import { z } from "zod";

const date = (label: string) =>
  z
    .string()
    .regex(/^\d{4}-\d{2}-\d{2}$/, `${label} must be a date like 2026-12-01.`)
    .optional();

export const auditQuerySchema = z.object({
  actorId: z.uuid("Choose the person from the list.").optional(),
  action: z.string().trim().max(100, "The action is at most 100 characters.").optional(),
  entity: z.string().trim().max(50, "The record kind is at most 50 characters.").optional(),
  entityId: z.string().trim().max(100, "The record id is at most 100 characters.").optional(),
  from: date("From"),
  to: date("To"),
  page: z.coerce.number({ error: "The page must be a number." }).int("The page must be a whole number.").min(1, "Pages start at 1.").default(1),
  pageSize: z.coerce.number({ error: "The page size must be a number." }).int().min(1).max(200, "At most 200 events a page.").default(50),
});
export type AuditQuery = z.output<typeof auditQuerySchema>;
