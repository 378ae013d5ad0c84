import bcrypt from "bcryptjs";
import type { Knex } from "knex";
import { seedIntake } from "./demo-intake";

// The invented demo scenario: one lab's staff and one manufacturer. Idempotent: a second run keeps
// whatever is already there (including passwords someone changed while trying the demo).
export const DEMO_PASSWORD = "wickmark-demo";
export const DEMO_LAB = "Marrowfield Test Laboratory (invented)";

export const DEMO_ORGANISATIONS = [{ name: "Tallowby Ball Works (invented)" }];

export const DEMO_USERS = [
  { email: "technician@marrowfield.test", name: "Demo Technician", roles: ["technician"] },
  { email: "reviewer@marrowfield.test", name: "Demo Reviewer", roles: ["reviewer"] },
  // A second reader, so every drop can get its blind second reading in the demo.
  { email: "reviewer2@marrowfield.test", name: "Demo Second Reviewer", roles: ["reviewer"] },
  { email: "lead@marrowfield.test", name: "Demo Lead", roles: ["lead", "reviewer"] },
  { email: "maker@tallowby.test", name: "Demo Manufacturer", roles: ["manufacturer"], organisation: "Tallowby Ball Works (invented)" },
] as const;

export async function seed(knex: Knex): Promise<void> {
  for (const o of DEMO_ORGANISATIONS) {
    await knex.raw("insert into organisations (name) values (?) on conflict ((lower(name))) do nothing", [o.name]);
  }
  const rounds = Number(process.env.BCRYPT_ROUNDS ?? 12);
  const hash = await bcrypt.hash(DEMO_PASSWORD, rounds);
  for (const u of DEMO_USERS) {
    const orgName = "organisation" in u ? u.organisation : null;
    const org = orgName ? await knex("organisations").whereRaw("lower(name) = lower(?)", [orgName]).first("id") : null;
    await knex.raw("insert into users (email, name, roles, organisation_id, password_hash) values (?, ?, ?, ?, ?) on conflict ((lower(email))) do nothing", [
      u.email,
      u.name,
      [...u.roles],
      org?.id ?? null,
      hash,
    ]);
  }
  await seedIntake(knex);
}
