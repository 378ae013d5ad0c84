import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb } from "@/lib/db";
import type { Role } from "@/lib/users/rules";
import { Client, signedIn } from "../helpers/app";
import { demoOrganisationId, makeUser, uniqueEmail } from "../helpers/fixtures";
import { discoverRoutes } from "../helpers/routes";

// Every route handler × every role (and signed out) → the status the server must answer.
// Adding a route without an entry here fails the first test: add the entry with the route.
type Who = "anon" | Role;
const WHO: Who[] = ["anon", "technician", "reviewer", "lead", "manufacturer"];

interface Entry {
  /** A concrete path; `:target` is a fresh invited user, made for each request. */
  path: string;
  body?: () => unknown;
  expect: Record<Who, number>;
}

const everyone = (s: number): Record<Who, number> => ({ anon: s, technician: s, reviewer: s, lead: s, manufacturer: s });
const signedInOnly = (s: number): Record<Who, number> => ({ ...everyone(s), anon: 401 });
const leadOnly = (s: number): Record<Who, number> => ({ anon: 401, technician: 403, reviewer: 403, lead: s, manufacturer: 403 });

const MATRIX: Record<string, Entry> = {
  "GET /api/auth/[...nextauth]": { path: "/api/auth/session", expect: everyone(200) },
  "POST /api/auth/[...nextauth]": { path: "/api/auth/signout", body: () => ({}), expect: everyone(302) },
  "GET /api/health": { path: "/api/health", expect: everyone(200) },
  "GET /api/me": { path: "/api/me", expect: signedInOnly(200) },
  "GET /api/users": { path: "/api/users", expect: leadOnly(200) },
  "POST /api/users": {
    path: "/api/users",
    body: () => ({ email: uniqueEmail("matrix"), name: "Matrix Invitee", roles: ["technician"] }),
    expect: leadOnly(201),
  },
  "PATCH /api/users/[id]": { path: "/api/users/:target", body: () => ({ name: "Renamed By Matrix" }), expect: leadOnly(200) },
  "POST /api/users/[id]/invite": { path: "/api/users/:target/invite", body: () => ({}), expect: leadOnly(200) },
  "GET /api/organisations": { path: "/api/organisations", expect: leadOnly(200) },
  "GET /api/invites/[token]": { path: "/api/invites/no-such-token", expect: everyone(404) },
  "POST /api/invites/[token]": { path: "/api/invites/no-such-token", body: () => ({ password: "long enough password" }), expect: everyone(404) },
  "GET /api/dev/outbox": { path: "/api/dev/outbox", expect: leadOnly(200) },
};

const clients = new Map<Who, Client>();

beforeAll(async () => {
  clients.set("anon", new Client());
  const org = await demoOrganisationId();
  for (const who of WHO.filter((w): w is Role => w !== "anon")) {
    const u = await makeUser([who], { organisationId: who === "manufacturer" ? org : undefined });
    clients.set(who, await signedIn(u.email, u.password));
  }
});
afterAll(() => closeDb());

describe("authorization matrix", () => {
  it("has an entry for every route handler, and no entry for a route that is gone", () => {
    expect(Object.keys(MATRIX).sort()).toEqual(discoverRoutes());
  });

  for (const [key, entry] of Object.entries(MATRIX)) {
    const method = key.split(" ")[0];
    for (const who of WHO) {
      it(`${key} as ${who} → ${entry.expect[who]}`, async () => {
        let path = entry.path;
        if (path.includes(":target")) path = path.replace(":target", (await makeUser(["technician"], { invited: true })).id);
        // Sign-out ends the session: use a throwaway copy of the client's cookies.
        const client = key.startsWith("POST /api/auth") ? Object.assign(new Client(), { cookies: new Map(clients.get(who)!.cookies) }) : clients.get(who)!;
        const res = await client.request(method, path, entry.body ? { json: entry.body() } : {});
        expect(res.status, await res.text()).toBe(entry.expect[who]);
      });
    }
  }
});
