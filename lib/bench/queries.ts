import "server-only";
import type { Db } from "../db";

export async function insertProbe(q: Db, actorId: string): Promise<void> {
  await q("bench_probes").insert({ actor_id: actorId });
}
