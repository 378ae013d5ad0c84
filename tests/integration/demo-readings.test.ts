import { execFileSync } from "node:child_process";
import { mkdirSync, readFileSync, writeFileSync } from "node:fs";
import path from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { closeDb, db } from "@/lib/db";
import { stopBoss } from "@/lib/jobs";
import { listDropsOfRun } from "@/lib/drops/queries";
import { listReadingsOfDrop } from "@/lib/readings/queries";
import { currentReadings } from "@/lib/readings/rules";
import { dixonQ } from "@/lib/stats/outliers";
import type { Truth } from "@/scripts/clips/synth-clip";
import { DEMO_BALLS, DEMO_READ_SUBMISSION } from "@/seeds/demo-results-plan";
import { DEMO_READINGS_DIR, ensureDemoReadings } from "../helpers/demo-readings";
import { signedIn } from "../helpers/app";
import { demo } from "../helpers/fixtures";

// The demo's read submission, made through the real worker and services on the test stack (which
// seeds the demo rows but renders no demo recordings). Small recordings keep it quick.
const dir = DEMO_READINGS_DIR;
const log = (s: string) => console.log(`[demo-readings] ${s}`);

afterAll(async () => {
  await stopBoss();
  await closeDb();
});

async function demoRuns() {
  return db()("runs as r")
    .join("samples as x", "x.id", "r.sample_id")
    .join("submissions as s", "s.id", "x.submission_id")
    .where("s.reference", DEMO_READ_SUBMISSION)
    .orderBy("x.serial")
    .select("r.id", "x.serial", "r.accepted_at", "r.accepted_by", "r.accept_reason");
}

/** Everything the seed writes, to compare before and after a second call. */
async function snapshot() {
  const runs = await demoRuns();
  const ids = runs.map((r) => r.id);
  return {
    runs,
    clips: await db()("clips").whereIn("run_id", ids).orderBy("id").select("id", "status"),
    drops: await db()("drops").whereIn("run_id", ids).orderBy("id").select("id", "clip_id", "start_frame", "state", "agreed_time_s"),
    readings: await db()("readings as g").join("drops as d", "d.id", "g.drop_id").whereIn("d.run_id", ids).orderBy("g.id").select("g.id", "g.status"),
  };
}

describe("the demo's read submission", () => {
  it("every drop of every D-2026-0002 run is read twice through the services and agreed; a second call changes nothing", { timeout: 1_200_000 }, async () => {
    const t0 = Date.now();
    const result = await ensureDemoReadings(log);
    log(`first call: ${((Date.now() - t0) / 1000).toFixed(1)} s; per recording ${JSON.stringify(result.timings)}`);
    expect(result.problems).toEqual([]);
    // 60 readings, made by this call or by another test file's call that came first.
    const submitted = (await snapshot()).readings.filter((g) => g.status === "submitted").length;
    expect(submitted).toBe(60);
    expect([0, 60]).toContain(result.readingsSubmitted);

    const users = Object.fromEntries(
      (await db()("users").whereIn("email", ["reviewer@marrowfield.test", "reviewer2@marrowfield.test", "lead@marrowfield.test"]).select("email", "id")).map(
        (u) => [u.email, u.id],
      ),
    );
    const runs = await demoRuns();
    expect(runs.map((r) => r.serial)).toEqual(DEMO_BALLS.map((b) => b.serial).sort());
    const means = new Map<string, number[]>();
    for (const run of runs) {
      const drops = await listDropsOfRun(db(), run.id);
      expect(drops).toHaveLength(3);
      const truth = JSON.parse(readFileSync(path.join(dir, `${drops[0].clipName}.truth.json`), "utf8")) as Truth;
      for (const d of drops) {
        expect(d.state, `${run.serial} drop ${d.ordinal}`).toBe("agreed");
        const [first, second] = currentReadings(await listReadingsOfDrop(db(), d.id));
        expect([first.reviewerId, second.reviewerId]).toEqual([users["reviewer@marrowfield.test"], users["reviewer2@marrowfield.test"]]);
        // The first reader marks the true frames: their time is the pts difference the render reports.
        const t = truth.drops[d.ordinal - 1];
        expect([first.dispenseFrame, first.clearFrame]).toEqual([t.dispenseFrame, t.clearFrame]);
        expect([first.dispensePts, first.clearPts]).toEqual([t.dispensePts, t.clearPts]);
        expect(first.timeS).toBeCloseTo(t.frameDuration, 9);
        expect(d.agreedTimeS).toBeCloseTo((first.timeS! + second.timeS!) / 2, 12);
        means.set(run.serial, [...(means.get(run.serial) ?? []), d.agreedTimeS!]);
      }
    }
    const hl2101 = runs.find((r) => r.serial === "HL-2101")!;
    expect(hl2101.accepted_at).not.toBeNull();
    expect(hl2101.accepted_by).toBe(users["lead@marrowfield.test"]);
    expect(hl2101.accept_reason).toMatch(/^Acclimation 14 h/);

    // The story the demo tells: no drop below 135 s, four ball means in the 10 s guard band, and
    // Dixon's Q (95 %, critical 0.970 for n = 3: Rorabacher 1991, Analytical Chemistry 63(2))
    // flags one drop, on HL-2104 only.
    const all = [...means.values()].flat();
    expect(Math.min(...all)).toBeGreaterThan(135);
    const ballMeans = [...means].map(([serial, v]) => [serial, v.reduce((a, b) => a + b, 0) / v.length] as const);
    expect(ballMeans.filter(([, m]) => m < 145).map(([s]) => s)).toEqual(["HL-2002", "HL-2101", "HL-2105", "HL-2107"]);
    expect([...means].filter(([, v]) => dixonQ(v, 0.95).isOutlier).map(([s]) => s)).toEqual(["HL-2104"]);
    log(`ball means: ${ballMeans.map(([s, m]) => `${s} ${m.toFixed(3)}`).join(", ")}`);

    const before = await snapshot();
    const t1 = Date.now();
    const again = await ensureDemoReadings(log);
    log(`second call: ${((Date.now() - t1) / 1000).toFixed(1)} s`);
    expect(again).toEqual({ timings: [], readingsSubmitted: 0, problems: [] });
    expect(await snapshot()).toEqual(before);
  });

  // The one test file that seeds the demo's readings (it must come first), so the demo's report is checked here.
  it("renders the demo's read submission as a PDF report", { timeout: 120_000 }, async () => {
    const lead = await signedIn(demo.email("lead"), demo.password);
    const id = (await db()("submissions").where({ reference: DEMO_READ_SUBMISSION }).first("id")).id;
    const t0 = performance.now();
    const res = await lead.get(`/api/submissions/${id}/report.pdf`);
    const bytes = Buffer.from(await res.arrayBuffer());
    // A figure for the record, not a target: speed belongs in benchmarks.
    log(`report: ${bytes.length} bytes in ${(performance.now() - t0).toFixed(0)} ms`);
    expect(res.status).toBe(200);
    writeFileSync(path.join(dir, "demo.pdf"), bytes);
    const shots = path.resolve(import.meta.dirname, "../../test-results/screenshots");
    mkdirSync(shots, { recursive: true });
    execFileSync("pdftoppm", ["-png", "-r", "80", "-f", "1", "-l", "1", path.join(dir, "demo.pdf"), path.join(shots, "report-demo")]);
    const text = execFileSync("pdftotext", [path.join(dir, "demo.pdf"), "-"], { encoding: "utf8" }).replace(/\s+/g, " ");
    expect(text).toContain(DEMO_READ_SUBMISSION);
    expect(text).toContain("close to limit");
  });
});
