import { z } from "zod";
import { text } from "../schema-parts";
import { emailSchema } from "../users/schema";

const name = text("Name", 120).refine((v) => !/[<>]/.test(v), "Name cannot contain < or >.");
const contactEmails = z.array(emailSchema).max(20, "At most 20 contact addresses.");

export const organisationInputSchema = z.object({ name, contactEmails: contactEmails.default([]) });
export type OrganisationInput = z.input<typeof organisationInputSchema>;

export const organisationUpdateSchema = z
  .object({ name: name.optional(), contactEmails: contactEmails.optional() })
  .refine((v) => v.name !== undefined || v.contactEmails !== undefined, { message: "Nothing to change." });
