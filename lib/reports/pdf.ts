import { digitsAgainst } from "../numbers";
import { judgedThresholds } from "../results/words";
import { formatTemperature } from "../units/rules";
import { KIND_LABELS } from "../submissions/schema";
import type { ReportData } from "./data";
import { CAUTION, editionRows, fixed, frameRate, utc, utcShort } from "./format";
import { box, facts, furnish, heading, newDoc, paragraph, table, toBuffer, ALERT, MUTED, type Doc } from "./pdf-layout";

// The test report as a PDF: one reader's walk from the submission to the decision and its evidence.

const TITLE = "Oil absorption test report";
const STATUS_WORDS = { meets: "meets", close: "close", below: "below", pending: "pending" } as const;

function revisionOf(r: ReportData, short = false): string {
  const rev = `Revision ${r.signOff.revision}`;
  if (r.signOff.signature) return rev;
  return short ? `${rev} · draft` : `${rev}, draft: not signed off`;
}

/** Under the title: who released this revision, or that it is a draft nobody has released. */
function status(doc: Doc, r: ReportData): void {
  const g = r.signOff.signature;
  if (g) paragraph(doc, `Signed off by ${g.by} on ${utc(g.at)}: ${g.meaning} (revision ${g.revision}).`, { bold: true });
  else paragraph(doc, "DRAFT: not signed off. These results are not released; they may still change.", { bold: true, color: ALERT });
}

function front(doc: Doc, r: ReportData): void {
  const s = r.submission;
  doc.font("Noto-Bold").fontSize(18).text(TITLE);
  paragraph(doc, `${s.reference} · ${revisionOf(r)} · generated ${utc(r.generatedAt)}`, { color: MUTED });
  doc.moveDown(0.4);
  status(doc, r);
  doc.moveDown(0.4);
  paragraph(doc, `Caution: ${CAUTION}`, { size: 8.5, color: MUTED });
  heading(doc, "Submission");
  facts(doc, [
    ["Laboratory", r.labName],
    ["Manufacturer", s.organisationName],
    ["Model", s.modelName],
    ["Kind", `${KIND_LABELS[s.kind]}${s.kind === "surveillance" && s.approvalReference ? ` (approval ${s.approvalReference})` : ""}`],
    ["Reference", s.reference],
    ["Received", s.receivedOn],
    ["Specification edition", `${r.edition.name} (effective ${r.edition.effectiveFrom})`],
  ]);
  heading(doc, "Decision");
  const d = r.decision;
  // Once signed off, the next step the results screen shows is done: the report leaves it out.
  const lines = r.signOff.signature ? [d.explanation] : [d.explanation, `Next: ${d.nextAction}`];
  if (d.tolerance) {
    const t = d.tolerance;
    lines.push(
      `Tolerance of the judged values: n ${t.n}, mean ${fixed(t.mean, 1)} s, SD ${fixed(t.sd, 2)} s, k ${fixed(t.k, 3)}, lower limit ${t.limit.toFixed(digitsAgainst(t.limit, [r.edition.minAbsorptionS], 2))} s${d.finalRound ? "" : " (it decides only once every planned round is in)"}.`,
    );
  }
  box(doc, `Round ${d.round}: ${d.decision}`, lines);
}

function edition(doc: Doc, r: ReportData): void {
  heading(doc, `Specification edition: ${r.edition.name}`);
  table(
    doc,
    [
      { head: "Value", width: 170 },
      { head: "Set to", width: 110, align: "right" },
      { head: "Source", width: 219 },
    ],
    editionRows(r.edition),
  );
}

function samples(doc: Doc, r: ReportData): void {
  heading(doc, "Rounds, samples and run conditions");
  const tested = r.samples.filter((x) => x.run);
  table(
    doc,
    [
      { head: "Ball", width: 64 },
      { head: "Round", width: 34, align: "right" },
      { head: "Weight g", width: 48, align: "right" },
      { head: "Weight lb", width: 46, align: "right" },
      { head: "Tested (UTC)", width: 78 },
      { head: "Surface °C", width: 46, align: "right" },
      { head: "Room °C", width: 40, align: "right" },
      { head: "Ra mean µm", width: 46, align: "right" },
      { head: "Acclim. h", width: 40, align: "right" },
      { head: "Flags", width: 57 },
    ],
    r.samples.map((x) => [
      x.serial,
      String(x.round),
      fixed(x.weightG, 2),
      fixed(x.weightLb, 3),
      x.run ? utcShort(x.run.testedAt) : "not tested",
      fixed(x.run?.surfaceTempC, 1),
      fixed(x.run?.roomTempC, 1),
      fixed(x.run?.roughness.mean, 3),
      fixed(x.run?.acclimationH, 1),
      x.run ? (x.run.flags.length ? (x.run.acceptedAt ? "flagged, accepted" : "flagged") : "none") : "—",
    ]),
  );
  doc.moveDown(0.6);
  table(
    doc,
    [
      { head: "Ball", width: 64 },
      { head: "Technician", width: 90 },
      { head: "Preparation", width: 165 },
      { head: "Oil lot", width: 70 },
      { head: "Camera", width: 50 },
      { head: "Dispenser check", width: 60, align: "right" },
    ],
    tested.map(({ serial, run }) => [
      serial,
      run!.technicianName,
      [run!.prepMethod, run!.prepAbrasive, run!.prepPadPosition].filter(Boolean).join("; "),
      run!.oilLot,
      run!.cameraId,
      run!.dispenserCheckValue === null ? "—" : `${run!.dispenserCheckValue} ${run!.dispenserCheckUnit === "uL" ? "µL" : "mg"}`,
    ]),
  );
  for (const { serial, run } of tested) {
    if (!run!.flags.length) continue;
    const accepted = run!.acceptedAt
      ? ` Accepted by ${run!.acceptedByName} on ${utc(run!.acceptedAt)}: ${run!.acceptReason}`
      : " Not accepted: the ball's result waits for a lead.";
    doc.moveDown(0.3);
    paragraph(doc, `${serial} (${formatTemperature(run!.surfaceTempC)} surface): ${run!.flags.map((f) => f.message).join(" ")}${accepted}`, { size: 8 });
  }
}

function balls(doc: Doc, r: ReportData): void {
  heading(doc, "Ball results");
  // A judged value gets the decimals that keep it on its own side of the minimum and the guard band's top.
  const every = r.edition.criterion === "every_drop";
  const lines = judgedThresholds(r.edition);
  const judgedFixed = (v: number | null, digits: number) => (v === null ? "—" : v.toFixed(digitsAgainst(v, lines, digits)));
  const rows = r.balls.map((b) => [
    b.serial,
    String(b.round),
    String(b.n),
    every ? fixed(b.mean, 1) : judgedFixed(b.mean, 1),
    fixed(b.sd, 2),
    every ? judgedFixed(b.min, 3) : fixed(b.min, 3),
    fixed(b.max, 3),
    fixed(b.range, 3),
    judgedFixed(b.value, 1),
    b.status === "pending" ? `pending: ${b.pendingReason}` : STATUS_WORDS[b.status],
    b.dixon ? `${fixed(b.dixon.q, 3)} / ${fixed(b.dixon.critical, 3)}${b.dixon.outlierDropId ? " flagged" : ""}` : "—",
  ]);
  table(
    doc,
    [
      { head: "Ball", width: 60 },
      { head: "Round", width: 32, align: "right" },
      { head: "n", width: 22, align: "right" },
      { head: "Mean s", width: 40, align: "right" },
      { head: "SD s", width: 36, align: "right" },
      { head: "Min s", width: 40, align: "right" },
      { head: "Max s", width: 40, align: "right" },
      { head: "Range s", width: 40, align: "right" },
      { head: "Judged s", width: 42, align: "right" },
      { head: "Status", width: 77 },
      { head: "Dixon Q / crit.", width: 70, align: "right" },
    ],
    rows,
  );
  paragraph(
    doc,
    `Judged value: the ${r.edition.criterion === "every_drop" ? "shortest drop" : "ball mean"}. Dixon's Q at 95 % flags a drop; it is never removed.`,
    { size: 7.5, color: MUTED },
  );
}

function dropsTable(doc: Doc, r: ReportData): void {
  heading(doc, "Drops: frames, times and readers");
  const rows = r.drops.map((d) => {
    const [a, b] = [d.readings.find((x) => x.slot === 1), d.readings.find((x) => x.slot === 2)];
    return [
      d.serial,
      String(d.ordinal),
      d.state,
      a ? String(a.dispenseFrame) : "—",
      a ? String(a.clearFrame) : "—",
      b ? String(b.dispenseFrame) : "—",
      b ? String(b.clearFrame) : "—",
      fixed(d.timeS, 3),
      fixed(d.uncertaintyS, 3),
      d.readings.map((x) => x.reader).join("; ") || "—",
      d.outlier ? "Q" : "",
    ];
  });
  table(
    doc,
    [
      { head: "Ball", width: 52 },
      { head: "Drop", width: 26, align: "right" },
      { head: "State", width: 50 },
      { head: "1st disp. frame", width: 42, align: "right" },
      { head: "1st clear frame", width: 38, align: "right" },
      { head: "2nd disp. frame", width: 42, align: "right" },
      { head: "2nd clear frame", width: 38, align: "right" },
      { head: "Time s", width: 42, align: "right" },
      { head: "U (k = 2) s", width: 38, align: "right" },
      { head: "Readers (1st; 2nd)", width: 104 },
      { head: "Q", width: 27 },
    ],
    r.drops.length ? rows : [["No drops yet", "", "", "", "", "", "", "", "", "", ""]],
  );
  paragraph(
    doc,
    "Frames are 0-based frame numbers of the drop's recording; disp.: dispense. Time: the agreed or ruled time. U: the larger expanded frame-quantisation uncertainty of the two readings. Q: the drop Dixon's Q flags; it still counts.",
    { size: 7.5, color: MUTED },
  );
}

function clips(doc: Doc, r: ReportData): void {
  heading(doc, "Recordings");
  const rows = r.clips.map((c) => [c.originalName, String(c.frameCount ?? "—"), frameRate(c.rate, c.averageRate), c.sha256 ?? "not hashed"]);
  table(
    doc,
    [
      { head: "File", width: 120 },
      { head: "Frames", width: 40, align: "right" },
      { head: "Rate fps", width: 52, align: "right" },
      { head: "SHA-256", width: 287 },
    ],
    rows.length ? rows : [["No recordings", "", "", ""]],
    7,
  );
  // Where a recording was cut from: the frames it really holds, in the original's seconds.
  for (const c of r.clips) if (c.trimNote) paragraph(doc, `${c.originalName}: ${c.trimNote}`, { size: 7.5, color: MUTED });
}

function rulings(doc: Doc, r: ReportData): void {
  heading(doc, "Rulings");
  const list = r.signOff.rulings;
  if (list.length === 0) {
    paragraph(doc, "No rulings have been made on this submission's drops.");
    return;
  }
  table(
    doc,
    [
      { head: "Ball", width: 56 },
      { head: "Drop", width: 28, align: "right" },
      { head: "Accepted", width: 92 },
      { head: "Ruled time s", width: 44, align: "right" },
      { head: "Lead, when (UTC)", width: 84 },
      { head: "Reason", width: 195 },
    ],
    list.map((x) => [x.serial, String(x.dropOrdinal), x.accepted, fixed(x.timeS, 3), `${x.lead}, ${utcShort(x.at)}`, x.reason]),
  );
  paragraph(
    doc,
    "A lead settles a drop whose two readings disagree by accepting one of them or by reading it a third time; the readings themselves are never changed.",
    { size: 7.5, color: MUTED },
  );
}

function signOff(doc: Doc, r: ReportData): void {
  heading(doc, "Sign-off");
  const { signature, changes, history, revision } = r.signOff;
  if (!signature) paragraph(doc, `Not signed off: draft report (revision ${revision}). A lead's signature releases the results.`, { bold: true, color: ALERT });
  else
    facts(doc, [
      ["Signed by", signature.by],
      ["When", utc(signature.at)],
      ["Meaning", signature.meaning],
      ["Revision", String(signature.revision)],
    ]);
  if (changes) {
    doc.moveDown(0.5);
    paragraph(doc, `Changed since revision ${revision - 1}`, { bold: true });
    paragraph(doc, `Re-opened because: ${changes.reopenReason}`, { size: 8.5 });
    for (const l of changes.lines) paragraph(doc, `• ${l}`, { size: 8.5 });
  }
  if (history.length > 1) {
    doc.moveDown(0.5);
    table(
      doc,
      [
        { head: "Revision", width: 46, align: "right" },
        { head: "Re-opened (UTC), reason", width: 253 },
        { head: "Signed off by, when (UTC)", width: 200 },
      ],
      history.map((h) => [
        String(h.revision),
        h.reopened ? `${utcShort(h.reopened.at)}: ${h.reopened.reason}` : "first issue",
        h.signature ? `${h.signature.by}, ${utcShort(h.signature.at)}` : "not signed off",
      ]),
    );
  }
}

/** Renders the report; the bytes are the whole PDF. */
export async function renderReportPdf(r: ReportData): Promise<Buffer> {
  const doc = newDoc(`${TITLE} ${r.submission.reference}`);
  for (const part of [front, edition, samples, balls, dropsTable, clips, rulings, signOff]) part(doc, r);
  furnish(doc, { lab: r.labName, title: TITLE, reference: r.submission.reference, revision: revisionOf(r, true), draft: !r.signOff.signature }, CAUTION);
  return toBuffer(doc);
}
