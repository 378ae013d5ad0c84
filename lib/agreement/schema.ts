import { z } from "zod";
import { isoDate } from "../schema-parts";

// The period the agreement is computed over: whole UTC days, both ends included.

export const DEFAULT_DAYS = 90;
const DAY_MS = 86_400_000;

const day = (d: Date) => d.toISOString().slice(0, 10);

/** The default period: the last 90 days up to and including today (UTC). */
export function defaultRange(now = new Date()): { from: string; to: string } {
  return { from: day(new Date(now.getTime() - (DEFAULT_DAYS - 1) * DAY_MS)), to: day(now) };
}

const optionalDate = (label: string) => z.preprocess((v) => (v === "" ? undefined : v), isoDate(label).optional());

export const agreementQuerySchema = z
  .object({ from: optionalDate("The first day"), to: optionalDate("The last day") })
  .transform((q) => {
    const fallback = defaultRange();
    const to = q.to ?? (q.from && q.from > fallback.to ? q.from : fallback.to);
    const from = q.from ?? day(new Date(Date.parse(`${to}T00:00:00Z`) - (DEFAULT_DAYS - 1) * DAY_MS));
    return { from, to };
  })
  .refine((q) => q.from <= q.to, { message: "The first day must not be after the last day.", path: ["from"] });

export type AgreementQuery = z.output<typeof agreementQuerySchema>;

/** The instants bounding a period: from the first day's midnight (UTC) to the midnight after the last day. */
export function rangeInstants(q: AgreementQuery): { start: Date; end: Date } {
  return { start: new Date(`${q.from}T00:00:00Z`), end: new Date(Date.parse(`${q.to}T00:00:00Z`) + DAY_MS) };
}
