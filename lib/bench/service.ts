import "server-only";
import type { Actor } from "../auth/actor";
import { db } from "../db";
import { env } from "../env";
import { AppError } from "../errors";
import { insertProbe } from "./queries";

/** The benchmark's baseline: the same wrapper and session lookup as any route, then one insert. */
export async function recordProbe(actor: Actor): Promise<{ ok: true }> {
  if (!env().BENCH_ROUTES) throw new AppError("not_found", "No such page.");
  await insertProbe(db(), actor.id);
  return { ok: true };
}
