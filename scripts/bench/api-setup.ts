import { execFileSync } from "node:child_process";
import { randomBytes } from "node:crypto";
import path from "node:path";
import { hashPassword } from "../../lib/auth/password";
import { db } from "../../lib/db";
import { insertUser } from "../../lib/users/queries";
import { DEMO_PASSWORD } from "../../seeds/demo";
import { type Client, signedIn } from "../../tests/helpers/app";
import { clipSettled, ingestClipFile } from "../clips/ingest";
import { projectRoot } from "../services/service";

// The benchmark's cast: one drop per reviewer, each with a first reading submitted, made through
// the real API (the clips through the real worker). Each step returns the timed request's latency.

async function ok<T = any>(res: Response, what: string): Promise<T> {
  const text = await res.text();
  if (!res.ok) throw new Error(`${what}: ${res.status} ${text}`);
  return JSON.parse(text) as T;
}

const today = () => new Date().toISOString().slice(0, 10);

async function placedDrops(lead: Client, count: number, log: (s: string) => void): Promise<string[]> {
  await ok(
    await lead.post("/api/editions", {
      name: `Bench edition ${randomBytes(3).toString("hex")}`,
      effectiveFrom: today(),
      minAbsorptionS: 135,
      criterion: "ball_mean",
      dropsPerBall: 10,
      guardBandS: 10,
      roundSizes: [2, 8, 24],
      toleranceCoverage: 0.9,
      toleranceConfidence: 0.95,
      readingToleranceS: 0.5,
      minAcclimationH: 24,
      surfaceTempMinC: 20,
      surfaceTempMaxC: 24,
      roughnessMaxSdUm: 0.1,
      sources: {},
    }),
    "edition",
  );
  const org = (await ok(await lead.get("/api/organisations"), "organisations")).organisations[0].id;
  const file = path.join(projectRoot, ".data", "bench-api", "clip.mp4");
  execFileSync("ffmpeg", [
    "-v",
    "error",
    "-y",
    "-f",
    "lavfi",
    "-i",
    "testsrc2=size=320x180:rate=25:duration=2",
    "-c:v",
    "libx264",
    "-preset",
    "ultrafast",
    "-bf",
    "0",
    "-g",
    "12",
    "-pix_fmt",
    "yuv420p",
    file,
  ]);
  const leadId = (await ok(await lead.get("/api/me"), "me")).id;
  const drops: string[] = [];
  while (drops.length < count) {
    const s = (
      await ok(
        await lead.post("/api/submissions", {
          organisationId: org,
          modelName: `Bench model ${drops.length}`,
          kind: "approval",
          weightClassesLb: [15],
          receivedOn: today(),
        }),
        "submission",
      )
    ).submission;
    const now = Date.now();
    const sample = (
      await ok(
        await lead.post(`/api/submissions/${s.id}/samples`, {
          serial: `B-${drops.length}`,
          weight: { value: 15, unit: "lb" },
          receivedAt: new Date(now - 48 * 3600_000).toISOString(),
          acclimationStartedAt: new Date(now - 30 * 3600_000).toISOString(),
        }),
        "sample",
      )
    ).sample;
    const run = (
      await ok(
        await lead.post(`/api/samples/${sample.id}/runs`, {
          testedAt: new Date(now).toISOString(),
          roomTemp: { value: 22, unit: "C" },
          surfaceTemp: { value: 22, unit: "C" },
          prepMethod: "Wipe",
          roughnessRaUm: [0.4],
          oilLot: "L1",
          dispenserCheck: { value: 12, unit: "mg" },
        }),
        "run",
      )
    ).run;
    const clipId = await ingestClipFile(db(), run.id, file, leadId);
    if ((await clipSettled(db(), clipId, 300)) !== "ready") throw new Error("the bench clip was not made ready");
    for (const d of (await ok(await lead.get(`/api/runs/${run.id}/drops`), "drops")).drops) {
      await ok(await lead.request("PUT", `/api/drops/${d.id}/placement`, { json: { clipId, startFrame: 0 } }), "placement");
      drops.push(d.id);
    }
    log(`${drops.length} drops placed`);
  }
  return drops.slice(0, count);
}

async function timed(c: Client, method: string, p: string, json: unknown): Promise<{ ms: number; body: any }> {
  const t = performance.now();
  const res = await c.request(method, p, { json });
  const body = await ok(res, `${method} ${p}`);
  return { ms: performance.now() - t, body };
}

export async function prepareReaders(count: number, log: (s: string) => void) {
  const lead = await signedIn("lead@marrowfield.test", DEMO_PASSWORD);
  const drops = await placedDrops(lead, count, log);
  const hash = await hashPassword(DEMO_PASSWORD);
  return Promise.all(
    drops.map(async (dropId, i) => {
      const email = `bench-reader-${i}-${randomBytes(3).toString("hex")}@bench.test`;
      await insertUser(db(), { email, name: `Bench Reader ${i}`, roles: ["reviewer"], organisationId: null, passwordHash: hash });
      const c = await signedIn(email, DEMO_PASSWORD);
      let reading = (await timed(c, "POST", `/api/drops/${dropId}/readings`, { dispenseFrame: 2, clearFrame: 20 })).body.drop.myDraft.id as string;
      await timed(c, "POST", `/api/readings/${reading}/submit`, {});
      return {
        submitStep: async () => {
          reading = (await timed(c, "POST", `/api/readings/${reading}/corrections`, { reason: "Benchmark: the same marks again." })).body.drop.myDraft.id;
          return (await timed(c, "POST", `/api/readings/${reading}/submit`, {})).ms;
        },
        baselineStep: async () => {
          await timed(c, "POST", "/api/dev/bench-insert", {});
          return (await timed(c, "POST", "/api/dev/bench-insert", {})).ms;
        },
      };
    }),
  );
}
