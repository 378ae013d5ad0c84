import type { MailKind } from "./rules";

// The words of every notification: pure, so wording and links are tested without SMTP.

export interface MailContent {
  kind: MailKind;
  subject: string;
  text: string;
  html: string;
}

const esc = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
const FOOT = "The governing specification and the testing laboratory's own accredited procedure decide; Wickmark's limits and defaults are examples.";

interface Link {
  href: string;
  label: string;
}

/** A paragraph, a list (an array) of short lines, or a link. */
type Para = string | string[] | Link;

// In the plain text a link ends its line with nothing after it: a mail client links everything up
// to the next space, so a full stop or comma glued to the address would be taken into the link.
const linkText = (l: Link) => `${l.label}: ${l.href}`;
const linkHtml = (l: Link) => `<a href="${esc(l.href)}">${esc(l.label)}</a>`;
const prefs = (appUrl: string): Link => ({ href: `${appUrl}/account`, label: "your account page" });

function build(kind: MailKind, subject: string, paras: Para[], link: Link | null, appUrl: string): MailContent {
  const asText = (p: Para) => (typeof p === "string" ? p : Array.isArray(p) ? p.map((l) => `- ${l}`).join("\n") : linkText(p));
  const asHtml = (p: Para) =>
    typeof p === "string" ? `<p>${esc(p)}</p>` : Array.isArray(p) ? `<ul>${p.map((l) => `<li>${esc(l)}</li>`).join("")}</ul>` : `<p>${linkHtml(p)}</p>`;
  const all = link ? [...paras, link] : paras;
  const textParts = [...all.map(asText), "", FOOT, `You can switch off the optional notices on ${linkText(prefs(appUrl))}`];
  const html = [
    ...all.map(asHtml),
    `<p style="color:#555;font-size:90%">${esc(FOOT)} You can switch off the optional notices on ${linkHtml(prefs(appUrl))}.</p>`,
  ].join("");
  return { kind, subject, text: textParts.join("\n\n"), html };
}

export function discrepancyMail(o: {
  appUrl: string;
  dropId: string;
  reference: string;
  sampleSerial: string;
  ordinal: number;
  differenceS: number | null;
}): MailContent {
  const diff = o.differenceS === null ? "" : ` The two drop times differ by ${o.differenceS.toFixed(2)} s.`;
  return build(
    "discrepancy.new",
    `Discrepancy to settle: ${o.reference}, ball ${o.sampleSerial}, drop ${o.ordinal}`,
    [
      `Two readings of drop ${o.ordinal} on ball ${o.sampleSerial} (submission ${o.reference}) do not agree within the edition's tolerance.${diff}`,
      "A lead settles it with a ruling and a reason.",
    ],
    { href: `${o.appUrl}/drops/${o.dropId}`, label: "Open the drop" },
    o.appUrl,
  );
}

/**
 * A ball fell below the minimum. `judged` says what the edition judges (the ball mean or its
 * shortest drop); each value comes already written with the decimals that keep it below the limit;
 * `decides` is the edition's rule that such a ball fails the submission on its own.
 */
export function belowLimitMail(o: {
  appUrl: string;
  submissionId: string;
  reference: string;
  modelName: string;
  judged: "mean" | "shortest drop";
  balls: { serial: string; value: string }[];
  limit: string;
  decides: boolean;
}): MailContent {
  const list = o.balls.map((b) => `ball ${b.serial}: ${o.judged} ${b.value}`).join("; ");
  const what = o.judged === "mean" ? "mean absorption time" : "shortest drop time";
  const after = o.decides
    ? "Under the lab's specification edition a ball below the minimum fails the submission on its own. The lab releases the results and the report once a lead has signed them off."
    : "Testing continues; this is not the decision. The lab releases the results once a lead has signed them off.";
  return build(
    "ball.below_limit",
    `${o.reference} ${o.modelName}: a ball is below the limit during testing`,
    [
      `During testing of ${o.modelName} (submission ${o.reference}), the ${what} of ${o.balls.length === 1 ? "one ball is" : `${o.balls.length} balls are`} below the minimum of ${o.limit}: ${list}.`,
      after,
    ],
    { href: `${o.appUrl}/portal/submissions/${o.submissionId}`, label: "Open the submission in the portal" },
    o.appUrl,
  );
}

export function samplesRequestedMail(o: {
  appUrl: string;
  submissionId: string;
  reference: string;
  modelName: string;
  round: number;
  count: number;
  weight: string;
  dueBy: string;
  note: string;
}): MailContent {
  return build(
    "samples.requested",
    `${o.reference}: please send ${o.count} more samples for round ${o.round}`,
    [
      `The lab needs ${o.count} more sample balls of ${o.modelName} (submission ${o.reference}) for round ${o.round} of testing.`,
      `Weight: ${o.weight}. Please have them at the lab by ${o.dueBy}.`,
      ...(o.note ? [`Note from the lab: ${o.note}`] : []),
      "Please acknowledge the request in the portal and tell the lab how and when you ship them.",
    ],
    { href: `${o.appUrl}/portal/submissions/${o.submissionId}`, label: "Acknowledge in the portal" },
    o.appUrl,
  );
}

export function resultsReleasedMail(o: { appUrl: string; submissionId: string; reference: string; modelName: string; revision: number }): MailContent {
  const rev = o.revision > 1 ? ` (revision ${o.revision})` : "";
  return build(
    "results.released",
    `${o.reference} ${o.modelName}: results released${rev}`,
    [
      `A lead has reviewed and released the results of ${o.modelName} (submission ${o.reference})${rev}.`,
      { label: "The test report (PDF)", href: `${o.appUrl}/api/submissions/${o.submissionId}/report.pdf` },
    ],
    { href: `${o.appUrl}/portal/submissions/${o.submissionId}`, label: "See the results in the portal" },
    o.appUrl,
  );
}

const plural = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;
const MAX_LISTED = 20;

/** Counts only: how many drops wait and in which submissions, never a drop's state or another reader's work. */
export function reviewerDigestMail(o: {
  appUrl: string;
  name: string;
  day: string;
  waiting: number;
  submissions: { reference: string; count: number }[];
  oldest: Date | null;
}): MailContent {
  const lines = o.submissions.slice(0, MAX_LISTED).map((s) => `${s.reference}: ${plural(s.count, "drop")}`);
  const rest = o.submissions.length - lines.length;
  if (rest > 0) lines.push(`and ${plural(rest, "more submission")}`);
  const oldest = o.oldest ? [`The oldest has waited since ${o.oldest.toISOString().slice(0, 16).replace("T", " ")} UTC.`] : [];
  return build(
    "reviewer.digest",
    `${o.day}: ${plural(o.waiting, "drop")} waiting for you to read`,
    [
      `Hello ${o.name},`,
      `${o.waiting === 1 ? "One drop is" : `${o.waiting} drops are`} waiting for your reading, in ${plural(o.submissions.length, "submission")}:`,
      lines,
      ...oldest,
      "Each drop is read blind: you see another reader's marks only once both readings are in.",
    ],
    { href: `${o.appUrl}/queue`, label: "Open your reading queue" },
    o.appUrl,
  );
}
