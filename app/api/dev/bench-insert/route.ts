import { recordProbe } from "@/lib/bench/service";
import { route } from "@/lib/http/route";

// POST /api/dev/bench-insert — one insert, the benchmark's baseline (404 unless BENCH_ROUTES is on).
export const POST = route({ signedIn: true }, async ({ actor }) => recordProbe(actor));
