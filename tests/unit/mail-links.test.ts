import { describe, expect, it } from "vitest";
import { belowLimitMail, discrepancyMail, resultsReleasedMail, reviewerDigestMail, samplesRequestedMail } from "@/lib/notifications/templates";
import { inviteMail } from "@/lib/users/invite-mail";

// A mail client turns whatever runs from "http" to the next space into a link. Every URL in a plain
// text body must therefore end at a space or a line end, never with a full stop or comma glued on,
// and every address the mail names must be a real <a href> in the HTML body.
const APP = "https://lab.example.test";
const ID = "0b7f4f8e-1c1a-4a8e-9a57-3f4c1f1d2e3a";
const linkified = (text: string) => text.match(/https?:\/\/\S+/g) ?? [];
const hrefs = (html: string) => [...html.matchAll(/<a href="([^"]+)">/g)].map((m) => m[1].replace(/&#38;/g, "&"));
/** Text of the HTML outside its <a> elements: an address there would not be a link. */
const unlinked = (html: string) => html.replace(/<a [^>]*>.*?<\/a>/g, "").replace(/<[^>]+>/g, " ");

const mails: [string, { text: string; html?: string }, string[]][] = [
  [
    "discrepancy",
    discrepancyMail({ appUrl: APP, dropId: ID, reference: "D-1", sampleSerial: "S-1", ordinal: 2, differenceS: 1.5 }),
    [`${APP}/drops/${ID}`, `${APP}/account`],
  ],
  [
    "below the limit",
    belowLimitMail({
      appUrl: APP,
      submissionId: ID,
      reference: "D-1",
      modelName: "Model",
      judged: "mean",
      balls: [{ serial: "S-1", value: "12.3 s" }],
      limit: "15.0 s",
      decides: true,
    }),
    [`${APP}/portal/submissions/${ID}`, `${APP}/account`],
  ],
  [
    "samples requested",
    samplesRequestedMail({
      appUrl: APP,
      submissionId: ID,
      reference: "D-1",
      modelName: "Model",
      round: 2,
      count: 3,
      weight: "15 lb",
      dueBy: "2027-01-31",
      note: "Ship in the lab's own boxes.",
    }),
    [`${APP}/portal/submissions/${ID}`, `${APP}/account`],
  ],
  [
    "results released",
    resultsReleasedMail({ appUrl: APP, submissionId: ID, reference: "D-1", modelName: "Model", revision: 2 }),
    [`${APP}/api/submissions/${ID}/report.pdf`, `${APP}/portal/submissions/${ID}`, `${APP}/account`],
  ],
  [
    "reviewer digest",
    reviewerDigestMail({ appUrl: APP, name: "Reader", day: "2026-12-05", waiting: 2, submissions: [{ reference: "D-1", count: 2 }], oldest: null }),
    [`${APP}/queue`, `${APP}/account`],
  ],
  [
    "invitation",
    inviteMail({ to: "a@example.test", name: "New", invitedBy: "Lead", link: `${APP}/invite/abc-DEF_123`, expiresAt: new Date("2027-01-01T10:00:00Z") }),
    [`${APP}/invite/abc-DEF_123`],
  ],
];

describe("links in mails", () => {
  it.each(mails)("%s: every address in the text body is linkified whole, with no punctuation glued on", (_name, mail, urls) => {
    const found = linkified(mail.text);
    for (const url of urls) expect(found).toContain(url);
    for (const u of found) expect(u, `"${u}" in:\n${mail.text}`).toMatch(/[A-Za-z0-9/_-]$/);
  });

  it.each(mails)("%s: every address is a link in the HTML body", (_name, mail, urls) => {
    const html = mail.html ?? "";
    for (const url of urls) expect(hrefs(html)).toContain(url);
    expect(unlinked(html)).not.toMatch(/https?:\/\//);
  });
});
