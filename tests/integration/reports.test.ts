import { execFileSync } from "node:child_process";
import { mkdirSync, mkdtempSync, writeFileSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import Papa from "papaparse";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb, db } from "@/lib/db";
import { stopBoss } from "@/lib/jobs";
import { listOrganisations } from "@/lib/organisations/queries";
import type { ClipView } from "@/lib/clips/view";
import { BALL_COLUMNS, DROP_COLUMNS } from "@/lib/reports/csv";
import { CAUTION } from "@/lib/reports/format";
import type { ReleaseView } from "@/lib/signoff/release";
import { BEING_REVISED, NOT_RELEASED } from "@/lib/signoff/release-policy";
import type { ResultsView } from "@/lib/results/view";
import { signedIn, type Client } from "../helpers/app";
import { demo, makeUser } from "../helpers/fixtures";
import { newEdition, newRun, newSample, newSubmission } from "../helpers/intake";
import { plainMp4 } from "../helpers/media";
import { json, placeOnRun, read } from "../helpers/readings";

// The test report and the exports of a submission read through the API. The clip runs at exactly
// 25 fps, so a reading from frame 5 to frame 5 + k takes k/25 s. The edition is the test's own,
// with limits to suit 4 s clips (example values). The PDF's text is read back with pdftotext
// (poppler-utils), a real extractor, not our own code. One drop's readings disagree and a lead
// rules on it; later the results are signed off, re-opened with a reason, and signed again.
const RULING_REASON = "The second reader marked the clear frame a second late; the first reading matches the clip.";
const REOPEN_REASON = "A third sample ball was found at intake and belongs in round 1.";
let lead: Client;
let leadName: string;
let a: Client;
let b: Client;
let maker: Client;
let submission: { id: string; reference: string };
let organisationId: string;
let editionName: string;
const hashes: string[] = [];
const tmp = mkdtempSync(path.join(process.env.TEST_TMP_DIR ?? os.tmpdir(), "wickmark-report-"));
const SCREENSHOTS = path.resolve(import.meta.dirname, "../../test-results/screenshots");
const oneLine = (s: string) => s.replace(/\s+/g, " ").trim();

async function pdfText(res: Response, name: string): Promise<string> {
  const file = path.join(tmp, `${name}.pdf`);
  writeFileSync(file, Buffer.from(await res.arrayBuffer()));
  return execFileSync("pdftotext", ["-enc", "UTF-8", file, "-"], { encoding: "utf8" });
}
/** The saved PDF's text laid out as on the page (a table row or a label and its value on one line), spaces collapsed. */
const layoutText = (name: string) => oneLine(execFileSync("pdftotext", ["-layout", "-enc", "UTF-8", path.join(tmp, `${name}.pdf`), "-"], { encoding: "utf8" }));

beforeAll(async () => {
  lead = await signedIn(demo.email("lead"), demo.password);
  leadName = (
    await db()("users")
      .where({ email: demo.email("lead") })
      .first("name")
  ).name;
  const [ua, ub] = [await makeUser(["reviewer"], { name: "Reader One" }), await makeUser(["reviewer"], { name: "Reader Two" })];
  [a, b] = [await signedIn(ua.email, ua.password), await signedIn(ub.email, ub.password)];
  // The only edition in force on 2003-05-02: one round of two balls, 2.0 s minimum, 0.3 s guard band.
  editionName = (await newEdition(lead, { effectiveFrom: "2003-05-01", minAbsorptionS: 2.0, guardBandS: 0.3, roundSizes: [2], readingToleranceS: 0.5 })).name;
  organisationId = (await listOrganisations(db()))[0].id;
  submission = await newSubmission(lead, organisationId, { receivedOn: "2003-05-02" });
  await ball("RP-1", [75, 76, 77]);
  // RP-2's third drop: the second reader is 25 frames (1.0 s) later than the first, beyond the 0.5 s tolerance.
  const rp2 = await ball("RP-2", [70, 71, 72], [70, 71, 97]);
  await json(await lead.post(`/api/drops/${rp2[2]}/ruling`, { chosen: "first", reason: RULING_REASON }), 201);
  maker = await manufacturerOf(organisationId);
}, 300_000);

/** A ball of three drops read by both readers (the second reader's clear frames may differ); returns its drops. */
async function ball(serial: string, clears: readonly number[], secondClears = clears): Promise<string[]> {
  const sample = await newSample(lead, submission.id, { serial, round: 1 });
  const placed = await placeOnRun(lead, (await newRun(lead, sample.id)).id, { file: plainMp4(undefined, 4) });
  hashes.push((await json<{ clip: ClipView }>(await lead.get(`/api/clips/${placed.clipId}`), 200)).clip.sha256!);
  for (const [i, clear] of clears.entries()) {
    await read(a, placed.dropIds[i], 5, clear);
    await read(b, placed.dropIds[i], 5, secondClears[i]);
  }
  return placed.dropIds;
}

async function manufacturerOf(org: string): Promise<Client> {
  const u = await makeUser(["manufacturer"], { organisationId: org });
  return signedIn(u.email, u.password);
}

const file = (c: Client, name: string) => c.get(`/api/submissions/${submission.id}/${name}`);
const refusal = async (res: Response, status: number) => (await json<{ error: { message: string } }>(res, status)).error.message;
/** The report's pages at 60 dpi, to look at. */
function pages(name: string): void {
  mkdirSync(SCREENSHOTS, { recursive: true });
  execFileSync("pdftoppm", ["-png", "-r", "60", path.join(tmp, `${name}.pdf`), path.join(SCREENSHOTS, name)]);
}
afterAll(async () => {
  await stopBoss();
  await closeDb();
});

describe("the test report and exports", () => {
  it("the PDF carries the decision, its explanation, the clips' SHA-256, the edition and the caution", async () => {
    const results = await json<ResultsView>(await lead.get(`/api/submissions/${submission.id}/results`), 200);
    expect(results.decision.decision).toBe("meets limit");
    const res = await lead.get(`/api/submissions/${submission.id}/report.pdf`);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("application/pdf");
    expect(res.headers.get("content-disposition")).toBe(`attachment; filename="test-report-${submission.reference}.pdf"`);
    const text = await pdfText(res, "report");
    const flat = oneLine(text);
    expect(flat).toContain("Round 1: meets limit");
    expect(flat).toContain(oneLine(results.decision.explanation));
    for (const h of hashes) expect(text).toContain(h);
    expect(flat).toContain(editionName);
    expect(flat).toContain(oneLine(CAUTION));
    expect(flat).toContain("Revision 1, draft: not signed off");
    expect(flat).toContain("DRAFT: not signed off. These results are not released");
    // Every page says it is a draft.
    const pageCount = Number(/Page 1 of (\d+)/.exec(flat)![1]);
    expect(flat.split("DRAFT: not signed off, not a released result").length - 1).toBe(pageCount);
    expect(flat).toContain("Not signed off: draft report (revision 1)");
    // The ruling: ball, drop, the reading accepted with its reader, the ruled time (67/25 s), the lead and the reason.
    const rulings = flat.slice(flat.indexOf("Rulings Ball"));
    for (const piece of ["RP-2", "first reading (Reader One)", "2.680", `${leadName}, 20`, RULING_REASON]) expect(rulings).toContain(piece);
    // The ball mean to 0.1 s: (70 + 71 + 72)/3/25 = 2.84 s → 2.8; a drop to 0.001 s: 70/25 = 2.800 s.
    expect(flat).toMatch(/RP-1 1 3 2\.8 /);
    expect(flat).toContain("2.800");
    expect(flat).toMatch(/Page 1 of \d+/);
    mkdirSync(SCREENSHOTS, { recursive: true });
    execFileSync("pdftoppm", ["-png", "-r", "80", "-f", "1", "-l", "1", "-singlefile", path.join(tmp, "report.pdf"), path.join(SCREENSHOTS, "report-page-1")]);
    pages("report");
  }, 60_000);

  it("drops.csv has one row per drop with the documented columns", async () => {
    const res = await lead.get(`/api/submissions/${submission.id}/drops.csv`);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toMatch(/^text\/csv/);
    expect(res.headers.get("content-disposition")).toBe(`attachment; filename="drops-${submission.reference}.csv"`);
    const parsed = Papa.parse<Record<string, string>>(await res.text(), { header: true, skipEmptyLines: true });
    expect(parsed.errors).toEqual([]);
    expect(parsed.meta.fields).toEqual([...DROP_COLUMNS]);
    expect(parsed.data).toHaveLength(6);
    const first = parsed.data[0];
    expect(first).toMatchObject({
      submission: submission.reference,
      sample_serial: "RP-1",
      round: "1",
      drop: "1",
      state: "agreed",
      first_dispense_frame: "5",
      first_clear_frame: "75",
      second_clear_frame: "75",
      clip_sha256: hashes[0],
    });
    expect(Number(first.agreed_time_s)).toBeCloseTo(70 / 25, 9);
    expect(first.tested_at).toMatch(/^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}\.\d{3}Z$/);
  });

  it("balls.csv has one row per ball with its statistics", async () => {
    const res = await lead.get(`/api/submissions/${submission.id}/balls.csv`);
    const parsed = Papa.parse<Record<string, string>>(await res.text(), { header: true, skipEmptyLines: true });
    expect(parsed.meta.fields).toEqual([...BALL_COLUMNS]);
    expect(parsed.data.map((r) => r.sample_serial)).toEqual(["RP-1", "RP-2"]);
    const [one] = parsed.data;
    expect(one).toMatchObject({ n: "3", status: "meets", outlier_drop: "" });
    expect(Number(one.mean_s)).toBeCloseTo(71 / 25, 9);
    expect(Number(one.sd_s)).toBeCloseTo(1 / 25, 9);
    expect(Number(one.range_s)).toBeCloseTo(2 / 25, 9);
  });

  it("is refused to the manufacturer until the results are released", async () => {
    for (const name of ["report.pdf", "drops.csv", "balls.csv"]) {
      expect(await refusal(await file(maker, name), 403)).toBe("The lab shows the report to the manufacturer once a lead has released the results.");
    }
    expect(await refusal(await file(maker, "results"), 403)).toBe(NOT_RELEASED.results);
    expect(await json<ReleaseView>(await file(maker, "release"), 200)).toMatchObject({ state: "not released", revision: 1, signature: null });
  });

  it("once signed off, the manufacturer gets the results, the signed report and the exports; another organisation is told none exist", async () => {
    await json(await lead.post(`/api/submissions/${submission.id}/signoff`, { password: demo.password }), 201);
    const res = await file(maker, "report.pdf");
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("application/pdf");
    const flat = oneLine(await pdfText(res, "signed-1"));
    expect(flat).toMatch(new RegExp(`Signed off by ${leadName} on \\d{4}-\\d\\d-\\d\\d \\d\\d:\\d\\d UTC: results reviewed and released \\(revision 1\\)`));
    expect(layoutText("signed-1")).toMatch(
      new RegExp(`Signed by ${leadName} When \\d{4}-\\d\\d-\\d\\d \\d\\d:\\d\\d UTC Meaning results reviewed and released Revision 1`),
    );
    expect(flat).toContain(`Oil absorption test report · ${submission.reference} · Revision 1`);
    expect(flat).not.toMatch(/DRAFT|not signed off/);
    expect(flat).toContain(RULING_REASON);
    const drops = Papa.parse<Record<string, string>>(await (await file(maker, "drops.csv")).text(), { header: true, skipEmptyLines: true });
    expect(drops.meta.fields).toEqual([...DROP_COLUMNS]);
    expect(drops.data.map((d) => d.state)).toEqual(Array(6).fill("signed off"));
    const balls = Papa.parse<Record<string, string>>(await (await file(maker, "balls.csv")).text(), { header: true, skipEmptyLines: true });
    expect(balls.meta.fields).toEqual([...BALL_COLUMNS]);
    expect(balls.data).toHaveLength(2);
    expect((await json<ResultsView>(await file(maker, "results"), 200)).decision.decision).toBe("meets limit");
    expect(await json<ReleaseView>(await file(maker, "release"), 200)).toMatchObject({
      state: "released",
      revision: 1,
      signature: { revision: 1, signedBy: leadName, meaning: "results reviewed and released" },
    });
    const other = (await listOrganisations(db())).find((o) => o.id !== organisationId)!;
    const stranger = await manufacturerOf(other.id);
    for (const name of ["report.pdf", "drops.csv", "balls.csv", "results", "release"])
      expect(await refusal(await file(stranger, name), 404)).toBe("No such submission.");
  }, 60_000);

  it("re-opened, the manufacturer is told the results are being revised; signed again, the report is revision 2 and says what changed", async () => {
    await json(await lead.post(`/api/submissions/${submission.id}/reopen`, { reason: REOPEN_REASON }), 201);
    for (const name of ["report.pdf", "drops.csv", "balls.csv", "results"]) expect(await refusal(await file(maker, name), 403)).toBe(BEING_REVISED);
    expect(await json<ReleaseView>(await file(maker, "release"), 200)).toMatchObject({
      state: "revising",
      revision: 2,
      message: BEING_REVISED,
      signature: { revision: 1 },
    });
    const draft = oneLine(await pdfText(await file(lead, "report.pdf"), "draft-2"));
    expect(draft).toContain("Revision 2, draft: not signed off");
    expect(draft).toContain(`Changed since revision 1 Re-opened because: ${REOPEN_REASON}`);
    expect(draft).toContain("The changes in the results are recorded when a lead signs this revision off.");

    await ball("RP-3", [80, 81, 82]);
    await json(await lead.post(`/api/submissions/${submission.id}/signoff`, { password: demo.password }), 201);
    const res = await file(maker, "report.pdf");
    expect(res.status).toBe(200);
    const flat = oneLine(await pdfText(res, "signed-2"));
    expect(flat).toContain(`Oil absorption test report · ${submission.reference} · Revision 2`);
    expect(layoutText("signed-2")).toMatch(/Meaning results reviewed and released Revision 2/);
    expect(flat).toContain(`Changed since revision 1 Re-opened because: ${REOPEN_REASON} • Balls added: RP-3.`);
    // The revision history: the first issue and the re-opening, each with its signature.
    expect(layoutText("signed-2")).toMatch(new RegExp(`1 first issue ${leadName}, \\d{4}-\\d\\d-\\d\\d \\d\\d:\\d\\d`));
    expect(flat).toContain(REOPEN_REASON);
    expect(flat).not.toMatch(/DRAFT|not signed off/);
    pages("draft-2");
    pages("signed-2");
  }, 120_000);
});
