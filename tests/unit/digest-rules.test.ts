import { describe, expect, it } from "vitest";
import { digestCron, digestDay, summariseWaiting } from "@/lib/notifications/digest-rules";
import { reviewerDigestMail } from "@/lib/notifications/templates";

// The reviewers' digest: its schedule, its day, and what it may say (counts only, under the blind rule).
describe("digest schedule", () => {
  it("turns HH:MM (UTC) into a daily cron expression and refuses anything else in words", () => {
    expect(digestCron("07:00")).toBe("0 7 * * *");
    expect(digestCron("23:45")).toBe("45 23 * * *");
    for (const bad of ["7:00", "24:00", "07:60", "seven"]) expect(() => digestCron(bad)).toThrow(/HH:MM in UTC/);
  });

  it("belongs to the UTC calendar day, whatever the local zone", () => {
    expect(digestDay(new Date("2026-12-02T23:59:59Z"))).toBe("2026-12-02");
    expect(digestDay(new Date("2026-12-03T00:30:00+02:00"))).toBe("2026-12-02");
  });
});

describe("what a digest says", () => {
  const at = (iso: string) => new Date(iso);
  const drops = [
    { submissionId: "b", submissionReference: "D-2026-0010", placedAt: at("2026-12-01T09:00:00Z") },
    { submissionId: "a", submissionReference: "D-2026-0002", placedAt: at("2026-11-30T08:15:00Z") },
    { submissionId: "b", submissionReference: "D-2026-0010", placedAt: at("2026-12-01T10:00:00Z") },
  ];

  it("nothing waiting: no digest", () => {
    expect(summariseWaiting([])).toBeNull();
  });

  it("counts per submission, oldest first, and names the oldest wait", () => {
    const s = summariseWaiting(drops)!;
    expect(s).toEqual({
      waiting: 3,
      oldest: at("2026-11-30T08:15:00Z"),
      submissions: [
        { submissionId: "a", reference: "D-2026-0002", count: 1 },
        { submissionId: "b", reference: "D-2026-0010", count: 2 },
      ],
    });
    const mail = reviewerDigestMail({ appUrl: "http://x.test", name: "Ada", day: "2026-12-02", ...s });
    expect(mail.subject).toBe("2026-12-02: 3 drops waiting for you to read");
    expect(mail.text).toContain("- D-2026-0002: 1 drop\n- D-2026-0010: 2 drops");
    expect(mail.text).toContain("since 2026-11-30 08:15 UTC");
    expect(mail.html).toContain("<li>D-2026-0010: 2 drops</li>");
    expect(mail.text).not.toMatch(/read once|agreed|unread/);
  });
});
