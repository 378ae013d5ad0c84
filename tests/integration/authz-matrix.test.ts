import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb } from "@/lib/db";
import type { Role } from "@/lib/users/rules";
import { Client, signedIn } from "../helpers/app";
import { demo, demoOrganisationId, makeUser, PASSWORD, uniqueEmail } from "../helpers/fixtures";
import { uploadFile, waitForClip } from "../helpers/clips";
import { plainMp4 } from "../helpers/media";
import { editionBody, goodRun, newEdition, newRun, newSample, newSubmission, today, uniqueName } from "../helpers/intake";
import { placedDrops } from "../helpers/readings";
import { discoverRoutes } from "../helpers/routes";

// Every route handler × every role (and signed out) → the status the server must answer.
// Adding a route without an entry here fails the first test: add the entry with the route.
type Who = "anon" | Role;
const WHO: Who[] = ["anon", "technician", "reviewer", "lead", "manufacturer"];

interface Entry {
  /** A concrete path, or one built before each request (records the request may consume). */
  path: string | (() => Promise<string>);
  body?: () => unknown;
  expect: Record<Who, number>;
}

const everyone = (s: number): Record<Who, number> => ({ anon: s, technician: s, reviewer: s, lead: s, manufacturer: s });
const signedInOnly = (s: number): Record<Who, number> => ({ ...everyone(s), anon: 401 });
const leadOnly = (s: number): Record<Who, number> => ({ anon: 401, technician: 403, reviewer: 403, lead: s, manufacturer: 403 });
const staffOnly = (s: number): Record<Who, number> => ({ anon: 401, technician: s, reviewer: s, lead: s, manufacturer: 403 });
const intakeEditors = (s: number): Record<Who, number> => ({ anon: 401, technician: s, reviewer: 403, lead: s, manufacturer: 403 });

// Records in the matrix manufacturer's own organisation, made by the demo lead.
let lead: Client;
let org: string;
const invitedUser = async () => (await makeUser(["technician"], { invited: true })).id;
const submission = async () => (await newSubmission(lead, org)).id;
const sample = async () => (await newSample(lead, await submission())).id;
const run = async (over = {}) => (await newRun(lead, await sample(), over)).id;
const sampleRequestBody = () => ({ count: 24, weight: "15 lb", dueBy: "2099-01-31", note: "" });
const sampleRequest = async () => {
  const res = await lead.post(`/api/submissions/${await submission()}/sample-requests`, sampleRequestBody());
  return ((await res.json()) as { request: { id: string } }).request.id;
};
const flaggedRun = () => run({ surfaceTemp: { value: 30, unit: "C" } });
// Clips are lab evidence: a manufacturer is told they do not exist.
const clipReaders = (s: number): Record<Who, number> => ({ ...staffOnly(s), manufacturer: 404 });
const clipEditors = (s: number): Record<Who, number> => ({ ...intakeEditors(s), manufacturer: 404 });
let clipFile: string;
let clipRun: string;
let readyClip: string;
const uploadingClip = async () => (await uploadFile(lead, clipRun, clipFile, { stopAfter: 0 })).clipId;
const uploadedClip = async () => (await uploadFile(lead, clipRun, clipFile, { stopAfter: 1 })).clipId;

// Readings: the matrix reviewer works on drops of its own; a reading of the demo reviewer's is
// one the matrix reviewer is blind to (404), while staff who do not read drops may see it.
const drops: string[] = [];
let readerClient: Client;
const once = <T>(make: () => Promise<T>) => {
  let p: Promise<T> | undefined;
  return () => (p ??= make());
};
const startDraft = async (dropId: string) => {
  const res = await readerClient.post(`/api/drops/${dropId}/readings`, { dispenseFrame: 2, clearFrame: 20 });
  return (await res.json()).drop.myDraft.id as string;
};
const otherReading = once(async () => {
  const demoReviewer = await signedIn(demo.email("reviewer"), demo.password);
  return (await (await demoReviewer.post(`/api/drops/${drops[2]}/readings`, { dispenseFrame: 1 })).json()).drop.myDraft.id as string;
});
const draftToSubmit = once(() => startDraft(drops[3]));
const submittedReading = once(async () => {
  const id = await startDraft(drops[4]);
  await readerClient.post(`/api/readings/${id}/submit`);
  return id;
});
const readers = (s: number): Record<Who, number> => ({ anon: 401, technician: 403, reviewer: s, lead: 403, manufacturer: 403 });

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
  "PATCH /api/users/[id]": { path: async () => `/api/users/${await invitedUser()}`, body: () => ({ name: "Renamed By Matrix" }), expect: leadOnly(200) },
  "POST /api/users/[id]/invite": { path: async () => `/api/users/${await invitedUser()}/invite`, body: () => ({}), expect: leadOnly(200) },
  "GET /api/organisations": { path: "/api/organisations", expect: staffOnly(200) },
  "POST /api/organisations": { path: "/api/organisations", body: () => ({ name: uniqueName("Matrix Org"), contactEmails: [] }), expect: leadOnly(201) },
  "PATCH /api/organisations/[id]": {
    path: async () => `/api/organisations/${org}`,
    body: () => ({ contactEmails: ["matrix@example.test"] }),
    expect: leadOnly(200),
  },
  "GET /api/editions": { path: "/api/editions", expect: staffOnly(200) },
  "POST /api/editions": { path: "/api/editions", body: () => editionBody(), expect: leadOnly(201) },
  "GET /api/editions/[id]": { path: async () => `/api/editions/${(await newEdition(lead)).id}`, expect: staffOnly(200) },
  "PUT /api/editions/[id]": { path: async () => `/api/editions/${(await newEdition(lead)).id}`, body: () => editionBody(), expect: leadOnly(200) },
  "GET /api/submissions": { path: "/api/submissions", expect: signedInOnly(200) },
  "POST /api/submissions": {
    path: "/api/submissions",
    body: () => ({ organisationId: org, modelName: "Matrix model", kind: "research", receivedOn: today() }),
    expect: intakeEditors(201),
  },
  "GET /api/submissions/[id]": { path: async () => `/api/submissions/${await submission()}`, expect: signedInOnly(200) },
  "PATCH /api/submissions/[id]": { path: async () => `/api/submissions/${await submission()}`, body: () => ({ notes: "matrix" }), expect: intakeEditors(200) },
  "POST /api/submissions/[id]/samples": {
    path: async () => `/api/submissions/${await submission()}/samples`,
    body: () => ({ serial: "M-1", weight: { value: 7000, unit: "g" }, receivedAt: new Date().toISOString() }),
    expect: intakeEditors(201),
  },
  "POST /api/submissions/[id]/samples/import": {
    path: async () => `/api/submissions/${await submission()}/samples/import`,
    body: () => ({ csv: "M-1,7000\nM-2,7001", unit: "g", receivedAt: new Date().toISOString() }),
    expect: intakeEditors(201),
  },
  "PATCH /api/samples/[id]": { path: async () => `/api/samples/${await sample()}`, body: () => ({ notes: "matrix" }), expect: intakeEditors(200) },
  "DELETE /api/samples/[id]": { path: async () => `/api/samples/${await sample()}`, expect: intakeEditors(200) },
  "POST /api/samples/[id]/runs": { path: async () => `/api/samples/${await sample()}/runs`, body: () => goodRun(), expect: intakeEditors(201) },
  "GET /api/runs/[id]": { path: async () => `/api/runs/${await run()}`, expect: signedInOnly(200) },
  "PUT /api/runs/[id]": { path: async () => `/api/runs/${await run()}`, body: () => goodRun(), expect: intakeEditors(200) },
  "GET /api/runs/[id]/clips": { path: async () => `/api/runs/${clipRun}/clips`, expect: clipReaders(200) },
  "POST /api/runs/[id]/clips": {
    path: async () => `/api/runs/${clipRun}/clips`,
    body: () => ({ fileName: "m.mp4", size: 1000, contentType: "video/mp4" }),
    expect: clipEditors(201),
  },
  "GET /api/clips/[id]": { path: async () => `/api/clips/${readyClip}`, expect: clipReaders(200) },
  "GET /api/clips/[id]/upload": { path: async () => `/api/clips/${await uploadingClip()}/upload`, expect: clipEditors(200) },
  "POST /api/clips/[id]/parts/sign": {
    path: async () => `/api/clips/${await uploadingClip()}/parts/sign`,
    body: () => ({ partNumbers: [1] }),
    expect: clipEditors(200),
  },
  "PUT /api/clips/[id]/parts/[part]": {
    path: async () => `/api/clips/${await uploadingClip()}/parts/1`,
    body: () => ({ etag: '"abc"', size: 10 }),
    expect: clipEditors(200),
  },
  "POST /api/clips/[id]/complete": { path: async () => `/api/clips/${await uploadedClip()}/complete`, body: () => ({}), expect: clipEditors(200) },
  "GET /api/clips/[id]/frames": { path: async () => `/api/clips/${readyClip}/frames`, expect: clipReaders(200) },
  "POST /api/runs/[id]/acceptance": {
    path: async () => `/api/runs/${await flaggedRun()}/acceptance`,
    body: () => ({ reason: "Matrix acceptance reason." }),
    expect: leadOnly(200),
  },
  "POST /api/runs/[id]/void": {
    path: async () => `/api/runs/${await run()}/void`,
    body: () => ({ reason: "Matrix void: recorded on the wrong ball." }),
    expect: leadOnly(200),
  },
  "GET /api/invites/[token]": { path: "/api/invites/no-such-token", expect: everyone(404) },
  "POST /api/invites/[token]": { path: "/api/invites/no-such-token", body: () => ({ password: "long enough password" }), expect: everyone(404) },
  "GET /api/dev/outbox": { path: "/api/dev/outbox", expect: leadOnly(200) },
  "GET /api/mail": { path: "/api/mail", expect: leadOnly(200) },
  "GET /api/account/notifications": { path: "/api/account/notifications", expect: signedInOnly(200) },
  "PUT /api/account/notifications": { path: "/api/account/notifications", body: () => ({ optOut: [] }), expect: signedInOnly(200) },
  "GET /api/submissions/[id]/sample-requests": { path: async () => `/api/submissions/${await submission()}/sample-requests`, expect: signedInOnly(200) },
  "POST /api/submissions/[id]/sample-requests": {
    path: async () => `/api/submissions/${await submission()}/sample-requests`,
    body: sampleRequestBody,
    expect: intakeEditors(201),
  },
  // Only the manufacturer that owns the submission acknowledges its requests.
  "POST /api/sample-requests/[id]/acknowledge": {
    path: async () => `/api/sample-requests/${await sampleRequest()}/acknowledge`,
    body: () => ({ shippingDetails: "Courier, two boxes" }),
    expect: { anon: 401, technician: 403, reviewer: 403, lead: 403, manufacturer: 200 },
  },
  "POST /api/dev/bench-insert": { path: "/api/dev/bench-insert", body: () => ({}), expect: signedInOnly(404) },
  "GET /api/runs/[id]/drops": { path: async () => `/api/runs/${clipRun}/drops`, expect: clipReaders(200) },
  "GET /api/drops/[id]": { path: async () => `/api/drops/${drops[0]}`, expect: clipReaders(200) },
  "PUT /api/drops/[id]/placement": {
    path: async () => `/api/drops/${drops[0]}/placement`,
    body: () => ({ clipId: readyClip, startFrame: 0 }),
    expect: clipEditors(200),
  },
  "POST /api/drops/[id]/readings": { path: async () => `/api/drops/${drops[1]}/readings`, body: () => ({ dispenseFrame: 3 }), expect: readers(200) },
  "GET /api/readings/[id]": {
    path: async () => `/api/readings/${await otherReading()}`,
    expect: { anon: 401, technician: 200, reviewer: 404, lead: 200, manufacturer: 404 },
  },
  "PATCH /api/readings/[id]": { path: async () => `/api/readings/${await startDraft(drops[1])}`, body: () => ({ clearFrame: 30 }), expect: readers(200) },
  "DELETE /api/readings/[id]": { path: async () => `/api/readings/${await startDraft(drops[5])}`, expect: readers(200) },
  "POST /api/readings/[id]/submit": { path: async () => `/api/readings/${await draftToSubmit()}/submit`, body: () => ({}), expect: readers(200) },
  "POST /api/readings/[id]/corrections": {
    path: async () => `/api/readings/${await submittedReading()}/corrections`,
    body: () => ({ reason: "Matrix correction reason." }),
    expect: readers(201),
  },
  "GET /api/work-queue": { path: "/api/work-queue", expect: readers(200) },
  "GET /api/discrepancies": { path: "/api/discrepancies", expect: leadOnly(200) },
  "GET /api/drops/[id]/ruling": { path: async () => `/api/drops/${drops[0]}/ruling`, expect: clipReaders(200) },
  // The lead passes the gate and is told why this unread drop cannot be ruled.
  "POST /api/drops/[id]/ruling": {
    path: async () => `/api/drops/${drops[0]}/ruling`,
    body: () => ({ chosen: "first", reason: "Matrix ruling reason." }),
    expect: leadOnly(409),
  },
  "GET /api/submissions/[id]/signoff": { path: async () => `/api/submissions/${await submission()}/signoff`, expect: leadOnly(200) },
  // A new submission has no results to sign, and nothing signed to re-open: the lead is told so.
  "POST /api/submissions/[id]/signoff": {
    path: async () => `/api/submissions/${await submission()}/signoff`,
    body: () => ({ password: PASSWORD }),
    expect: leadOnly(409),
  },
  "POST /api/submissions/[id]/reopen": {
    path: async () => `/api/submissions/${await submission()}/reopen`,
    body: () => ({ reason: "Matrix re-opening reason." }),
    expect: leadOnly(409),
  },
  "GET /api/audit": { path: "/api/audit?pageSize=5", expect: leadOnly(200) },
  // Results reach the manufacturer only once released: until then its own submission's results are refused.
  "GET /api/submissions/[id]/results": { path: async () => `/api/submissions/${await submission()}/results`, expect: staffOnly(200) },
  // Whether the results are released: anyone who may see the submission (another organisation's is not found).
  "GET /api/submissions/[id]/release": { path: async () => `/api/submissions/${await submission()}/release`, expect: signedInOnly(200) },
  "GET /api/agreement": { path: "/api/agreement", expect: leadOnly(200) },
  // The report and exports follow the results: the manufacturer is refused until release.
  "GET /api/submissions/[id]/report.pdf": { path: async () => `/api/submissions/${await submission()}/report.pdf`, expect: staffOnly(200) },
  "GET /api/submissions/[id]/drops.csv": { path: async () => `/api/submissions/${await submission()}/drops.csv`, expect: staffOnly(200) },
  "GET /api/submissions/[id]/balls.csv": { path: async () => `/api/submissions/${await submission()}/balls.csv`, expect: staffOnly(200) },
};

const clients = new Map<Who, Client>();

beforeAll(async () => {
  clients.set("anon", new Client());
  lead = await signedIn(demo.email("lead"), demo.password);
  org = await demoOrganisationId();
  clipFile = plainMp4();
  clipRun = await run();
  readyClip = (await waitForClip(lead, (await uploadFile(lead, clipRun, clipFile)).clipId)).id;
  for (const who of WHO.filter((w): w is Role => w !== "anon")) {
    const u = await makeUser([who], { organisationId: who === "manufacturer" ? org : undefined });
    clients.set(who, await signedIn(u.email, u.password));
  }
  readerClient = clients.get("reviewer")!;
  for (const r of [clipRun, (await placedDrops(lead)).runId]) {
    const list = (await (await lead.get(`/api/runs/${r}/drops`)).json()).drops as { id: string; clip: unknown }[];
    drops.push(...list.map((d) => d.id));
  }
  await Promise.all(drops.slice(0, 3).map((id) => lead.request("PUT", `/api/drops/${id}/placement`, { json: { clipId: readyClip, startFrame: 0 } })));
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
        const path = typeof entry.path === "string" ? entry.path : await entry.path();
        // Sign-out ends the session: use a throwaway copy of the client's cookies.
        const client = key.startsWith("POST /api/auth") ? Object.assign(new Client(), { cookies: new Map(clients.get(who)!.cookies) }) : clients.get(who)!;
        const res = await client.request(method, path, entry.body ? { json: entry.body() } : {});
        expect(res.status, await res.text()).toBe(entry.expect[who]);
      });
    }
  }
});
