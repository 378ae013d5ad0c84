import { readdirSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { APP_URL } from "../helpers/app";

// A signed-out person following a link from a mail goes to sign-in, which remembers the page (with
// its query) to return to afterwards. Every page of the staff and portal groups, and the account
// page, is found on disk, so a new page is covered without being listed anywhere.
const APP = path.resolve(import.meta.dirname, "../../app");
const SOME_ID = "00000000-0000-4000-8000-000000000001";

function pages(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((d) => {
    const p = path.join(dir, d.name);
    if (d.isDirectory()) return d.name.startsWith("_") || d.name.startsWith("@") ? [] : pages(p);
    return d.name === "page.tsx" ? [path.dirname(p)] : [];
  });
}

/** The URL path of a page folder: route groups dropped, each [param] filled with an id. */
function urlOf(folder: string): string {
  const parts = path
    .relative(APP, folder)
    .split(path.sep)
    .filter((s) => !/^\(.*\)$/.test(s));
  return `/${parts.map((s) => (/^\[.*\]$/.test(s) ? SOME_ID : s)).join("/")}`;
}

const discovered = [...pages(path.join(APP, "(lab)")), ...pages(path.join(APP, "(portal)")), path.join(APP, "(shared)", "account")].map(urlOf);

// Links the mails and other pages hand out, checked by name as well.
const linked = [
  `/drops/${SOME_ID}`,
  `/drops/${SOME_ID}/ruling`,
  "/queue",
  "/discrepancies",
  `/audit?entity=submission&id=${SOME_ID}`,
  "/agreement",
  `/clips/${SOME_ID}`,
];

async function signInTarget(target: string, cookie?: string): Promise<string | null> {
  const res = await fetch(`${APP_URL}${target}`, { redirect: "manual", headers: cookie ? { cookie } : {} });
  expect([302, 303, 307, 308], `${target} answered ${res.status}`).toContain(res.status);
  const to = new URL(res.headers.get("location")!, APP_URL);
  expect(to.pathname, target).toBe("/sign-in");
  return to.searchParams.get("next");
}

describe("signed-out links keep where they were going", () => {
  it("finds the staff and portal pages on disk", () => {
    expect(discovered).toEqual(
      expect.arrayContaining(["/overview", "/queue", "/discrepancies", "/audit", "/agreement", `/clips/${SOME_ID}`, "/portal", "/account"]),
    );
  });

  it.each([...new Set([...linked, ...discovered])])("%s goes to sign-in with the page to return to", async (target) => {
    expect(await signInTarget(target)).toBe(target);
  });

  it("an expired or forged session cookie is sent the same way", async () => {
    for (const target of [`/drops/${SOME_ID}`, "/audit?action=run."]) {
      expect(await signInTarget(target, "next-auth.session-token=not-a-session")).toBe(target);
    }
  });

  it("public pages stay open", async () => {
    for (const target of ["/sign-in", "/help"]) expect((await fetch(`${APP_URL}${target}`, { redirect: "manual" })).status).toBe(200);
  });
});
