import { z } from "zod";
import { ROLES } from "./rules";

const noMarkup = (label: string) =>
  z
    .string({ error: `${label} is required.` })
    .trim()
    .min(1, `${label} is required.`)
    .max(120, `${label} must be at most 120 characters.`)
    .refine((v) => !/[<>]/.test(v), `${label} cannot contain < or >.`);

export const personNameSchema = noMarkup("Name");

export const emailSchema = z
  .string({ error: "E-mail is required." })
  .trim()
  .toLowerCase()
  .max(254, "E-mail must be at most 254 characters.")
  .pipe(z.email("Enter a valid e-mail address."));

export const rolesSchema = z
  .array(z.enum(ROLES, { error: "Unknown role." }), { error: "Roles are required." })
  .min(1, "Choose at least one role.")
  .max(ROLES.length)
  .transform((roles) => [...new Set(roles)]);

export const passwordSchema = z
  .string({ error: "Password is required." })
  .min(10, "Password must be at least 10 characters.")
  .max(200, "Password must be at most 200 characters.");

export const inviteInputSchema = z.object({
  email: emailSchema,
  name: personNameSchema,
  roles: rolesSchema,
  organisationId: z.uuid("Choose an organisation from the list.").nullish(),
});
export type InviteInput = z.infer<typeof inviteInputSchema>;

export const userUpdateSchema = z
  .object({
    name: personNameSchema.optional(),
    roles: rolesSchema.optional(),
    active: z.boolean({ error: "Active must be true or false." }).optional(),
  })
  .refine((v) => v.name !== undefined || v.roles !== undefined || v.active !== undefined, {
    message: "Nothing to change: give a name, roles or active.",
  });
export type UserUpdate = z.infer<typeof userUpdateSchema>;

export const acceptInviteSchema = z.object({ password: passwordSchema });

export const signInSchema = z.object({
  email: emailSchema,
  password: z.string({ error: "Password is required." }).min(1, "Password is required.").max(200),
});
