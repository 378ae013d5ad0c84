import { describe, expect, it } from "vitest";
import { navFor, splitNav } from "@/components/shell/nav-items";
import { roleSetProblem, selfChangeProblem, statusOf } from "@/lib/users/rules";

const ORG = "6f1c1a36-5d0e-4a57-9a55-1f6f1a4a2b11";

describe("roleSetProblem", () => {
  it("accepts lab roles in any combination without an organisation", () => {
    expect(roleSetProblem(["technician", "reviewer", "lead"], null)).toBeNull();
  });
  it("accepts a manufacturer with an organisation", () => {
    expect(roleSetProblem(["manufacturer"], ORG)).toBeNull();
  });
  it("refuses an empty role set, a mixed manufacturer, and a manufacturer without organisation", () => {
    expect(roleSetProblem([], null)).toMatch(/at least one role/);
    expect(roleSetProblem(["manufacturer", "reviewer"], ORG)).toMatch(/cannot also hold a lab role/);
    expect(roleSetProblem(["manufacturer"], null)).toMatch(/must belong to an organisation/);
    expect(roleSetProblem(["technician"], ORG)).toMatch(/Only manufacturer accounts/);
  });
});

describe("selfChangeProblem", () => {
  it("stops a lead from deactivating themselves or dropping their own lead role", () => {
    expect(selfChangeProblem("a", "a", { active: false })).toMatch(/cannot deactivate your own/);
    expect(selfChangeProblem("a", "a", { roles: ["reviewer"] })).toMatch(/cannot remove your own lead role/);
    expect(selfChangeProblem("a", "a", { roles: ["lead", "reviewer"] })).toBeNull();
    expect(selfChangeProblem("a", "b", { active: false })).toBeNull();
  });
});

describe("statusOf", () => {
  it("is invited until a password is set, deactivated whenever inactive", () => {
    expect(statusOf({ active: true, hasPassword: false })).toBe("invited");
    expect(statusOf({ active: true, hasPassword: true })).toBe("active");
    expect(statusOf({ active: false, hasPassword: true })).toBe("deactivated");
  });
});

describe("navFor", () => {
  it("shows user management only to leads and the outbox only with dev tools", () => {
    const labels = (roles: Parameters<typeof navFor>[0], dev = true) => navFor(roles, dev).map((i) => i.label);
    expect(labels(["technician"])).toEqual(["Overview", "Submissions", "Editions", "Help"]);
    expect(labels(["reviewer"])).toEqual(["Overview", "Submissions", "Reading queue", "Help"]);
    expect(labels(["lead"])).toEqual([
      "Overview",
      "Submissions",
      "Discrepancies",
      "Reviewer agreement",
      "Editions",
      "Organisations",
      "Users",
      "Audit",
      "Outbox",
      "Help",
    ]);
    expect(labels(["lead"], false)).toEqual([
      "Overview",
      "Submissions",
      "Discrepancies",
      "Reviewer agreement",
      "Editions",
      "Organisations",
      "Users",
      "Audit",
      "Help",
    ]);
    expect(labels(["reviewer", "technician"])).toEqual(["Overview", "Submissions", "Reading queue", "Editions", "Help"]);
    expect(labels(["lead", "reviewer"])).toEqual([
      "Overview",
      "Submissions",
      "Reading queue",
      "Discrepancies",
      "Reviewer agreement",
      "Editions",
      "Organisations",
      "Users",
      "Audit",
      "Outbox",
      "Help",
    ]);
    expect(labels(["manufacturer"])).toEqual(["Our submissions", "Help"]);
  });
});

describe("splitNav", () => {
  const labels = (items: { label: string }[]) => items.map((i) => i.label);
  it("keeps a lead's administration under one menu where its first item stood, and leaves a single item on the bar", () => {
    const lead = splitNav(navFor(["lead", "reviewer"], true));
    expect(labels(lead.before)).toEqual(["Overview", "Submissions", "Reading queue", "Discrepancies", "Reviewer agreement"]);
    expect(labels(lead.admin)).toEqual(["Editions", "Organisations", "Users", "Audit", "Outbox"]);
    expect(labels(lead.after)).toEqual(["Help"]);
    const tech = splitNav(navFor(["technician"], true));
    expect(labels(tech.before)).toEqual(["Overview", "Submissions", "Editions", "Help"]);
    expect(tech.admin).toEqual([]);
  });
});
