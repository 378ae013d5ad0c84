import { z } from "zod";

// Small zod pieces shared by the domain schemas (and so by forms and route handlers alike).

/** A number typed into a form arrives as a string; JSON clients may send a number. */
export const num = (label: string) =>
  z
    .union([z.number(), z.string().trim().min(1, `${label} is required.`)], { error: `${label} is required.` })
    .transform((v) => (typeof v === "number" ? v : Number(v.replace(",", "."))))
    .pipe(z.number({ error: `${label} must be a number.` }));

export const text = (label: string, max = 200) =>
  z
    .string({ error: `${label} is required.` })
    .trim()
    .min(1, `${label} is required.`)
    .max(max, `${label} must be at most ${max} characters.`);

export const optionalText = (label: string, max = 2000) => z.string().trim().max(max, `${label} must be at most ${max} characters.`).default("");

/** A UUID as the database makes them: the one pattern pages and routes test ids with. */
export const UUID_PATTERN = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export const isoDate = (label: string) => z.iso.date({ error: `${label} must be a date (YYYY-MM-DD).` });

/** An instant with its zone (the browser converts local input before sending). */
export const isoInstant = (label: string) =>
  z.iso.datetime({ offset: true, error: `${label} must be a date and time with its zone (ISO 8601).` }).transform((s) => new Date(s));

export const massSchema = z.object({
  value: num("Weight").refine((v) => v > 0, "Weight must be more than zero."),
  unit: z.enum(["g", "oz", "lb"], { error: "Choose g, oz or lb." }),
});

export const temperatureSchema = (label: string) =>
  z.object({
    value: num(label).refine((v) => v > -50 && v < 150, `${label} is outside any plausible test room.`),
    unit: z.enum(["C", "F"], { error: "Choose °C or °F." }),
  });

export const uuid = (what: string) => z.uuid(`Choose ${what} from the list.`);
