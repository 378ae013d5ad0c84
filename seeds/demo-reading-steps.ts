import { randomUUID } from "node:crypto";
import type { Knex } from "knex";
import type { Actor } from "../lib/auth/actor";
import { listReadingsOfDrop } from "../lib/readings/queries";
import { startReading, submitReading } from "../lib/readings/service";
import { findUserByEmail } from "../lib/users/queries";
import type { Marks } from "./demo-results-plan";

// The demo's people acting through the real services, shared by the demo seeds that read drops.

export async function actorByEmail(knex: Knex, email: string): Promise<Actor> {
  const u = await findUserByEmail(knex, email);
  if (!u?.active) throw new Error(`the demo account ${email} is missing or inactive`);
  return { id: u.id, email: u.email, name: u.name, roles: u.roles, organisationId: u.organisationId, requestId: randomUUID() };
}

/** One reviewer's reading of a drop, unless they already submitted one. 1 when submitted now. */
export async function readOnce(knex: Knex, actor: Actor, dropId: string, marks: Marks): Promise<number> {
  const mine = (await listReadingsOfDrop(knex, dropId)).filter((r) => r.reviewerId === actor.id);
  if (mine.some((r) => r.status === "submitted")) return 0;
  const view = await startReading(actor, dropId, marks);
  await submitReading(actor, view.myDraft!.id);
  return 1;
}
