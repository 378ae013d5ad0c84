import { createHash } from "node:crypto";
import { readFileSync } from "node:fs";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb, db } from "@/lib/db";
import { listOrganisations } from "@/lib/organisations/queries";
import { getObjectStream, objectExists, sha256OfStream } from "@/lib/storage";
import { signedIn, type Client } from "../helpers/app";
import { complete, sendParts, uploadFile, waitForClip } from "../helpers/clips";
import { demo } from "../helpers/fixtures";
import { newRun, newSample, newSubmission } from "../helpers/intake";
import { audioOnly, largeTextFile, pngImage, plainMp4, textFile, truncatedMp4 } from "../helpers/media";

let tech: Client;
let runId: string;

beforeAll(async () => {
  tech = await signedIn(demo.email("technician"), demo.password);
  const org = (await listOrganisations(db()))[0].id;
  const s = await newSubmission(tech, org);
  runId = (await newRun(tech, (await newSample(tech, s.id)).id)).id;
});
afterAll(() => closeDb());

const sha = (file: string) => createHash("sha256").update(readFileSync(file)).digest("hex");
const objectKeyOf = async (clipId: string) => (await db()("clips").where({ id: clipId }).first("object_key")).object_key as string;

describe("multipart upload straight to storage", () => {
  it("resumes an interrupted upload from the parts the server recorded", async () => {
    const file = largeTextFile(11 * 1024 * 1024 + 123);
    const { clipId, partCount } = await uploadFile(tech, runId, file, { stopAfter: 1 });
    expect(partCount).toBe(3);
    // A reloaded page asks what is there, then sends only the rest.
    const state = await (await tech.get(`/api/clips/${clipId}/upload`)).json();
    expect(state.parts.map((p: { partNumber: number }) => p.partNumber)).toEqual([1]);
    const early = await tech.post(`/api/clips/${clipId}/complete`);
    expect(early.status).toBe(409);
    expect((await early.json()).error.message).toMatch(/parts 2, 3 still to send/);
    await sendParts(tech, clipId, file, state, [2, 3]);
    await complete(tech, clipId);
    expect(await sha256OfStream(await getObjectStream(await objectKeyOf(clipId)))).toBe(sha(file));
    const clip = await waitForClip(tech, clipId);
    expect(clip.status).toBe("rejected");
    expect(clip.rejectReason).toMatch(/not a video recording Wickmark can read/);
  });

  it("treats a part recorded twice and a second completion as no change", async () => {
    const file = plainMp4();
    const { clipId } = await uploadFile(tech, runId, file, { stopAfter: 1 });
    const state = await (await tech.get(`/api/clips/${clipId}/upload`)).json();
    await sendParts(tech, clipId, file, state, [1]);
    expect(await complete(tech, clipId)).toEqual({ clipId, status: "processing" });
    // The second completion changes nothing: the clip is still being processed, or already ready.
    const again = await complete(tech, clipId);
    expect(again).toEqual({ clipId, status: expect.stringMatching(/^(processing|ready)$/) });
    const clip = await waitForClip(tech, clipId);
    expect(clip.status).toBe("ready");
    expect(clip.sha256).toBe(sha(file));
  });

  it("flags the same bytes uploaded twice as a duplicate of the first, without merging", async () => {
    const file = plainMp4();
    const first = await waitForClip(tech, (await uploadFile(tech, runId, file)).clipId);
    const second = await waitForClip(tech, (await uploadFile(tech, runId, file, { name: "copy.mp4" })).clipId);
    expect(second.duplicateOf).toBe(first.id);
    expect(first.duplicateOf).toBeNull();
    expect(second.status).toBe("ready");
    expect(second.steps.find((s) => s.step === "hash")?.reason).toMatch(/duplicate/);
  });
});

describe("bad files are rejected with their own reason, and kept", () => {
  const cases: [string, () => string, RegExp][] = [
    ["a text file named .mp4", () => textFile("recording.mp4"), /not a video recording Wickmark can read/],
    ["a truncated MP4 (moov missing)", truncatedMp4, /index \(the 'moov' box\) is missing/],
    ["an audio-only file", audioOnly, /sound but no picture/],
    ["a PNG image", pngImage, /still image \(PNG\)/],
  ];
  for (const [what, make, reason] of cases) {
    it(`rejects ${what}`, async () => {
      const file = make();
      const { clipId } = await uploadFile(tech, runId, file);
      const clip = await waitForClip(tech, clipId);
      expect(clip.status).toBe("rejected");
      expect(clip.rejectReason).toMatch(reason);
      expect(clip.steps.find((s) => s.step === "verify")).toMatchObject({ state: "failed", attempts: 1 });
      expect(await objectExists(await objectKeyOf(clipId))).toBe(true);
    });
  }

  it("keeps an empty file and one declared over the size limit on record as rejected", async () => {
    const empty = await tech.post(`/api/runs/${runId}/clips`, { fileName: "empty.mp4", size: 0, contentType: "video/mp4" });
    expect(await empty.json()).toMatchObject({ status: "rejected", rejectReason: expect.stringMatching(/empty \(0 bytes\)/) });
    const huge = await tech.post(`/api/runs/${runId}/clips`, { fileName: "all-day.mp4", size: 20 * 1024 ** 4, contentType: "video/mp4" });
    const body = await huge.json();
    expect(body).toMatchObject({ status: "rejected", partCount: 0 });
    expect(body.rejectReason).toMatch(/The file is 20 TB; the largest recording accepted is 8\.0 GB/);
    const listed = (await (await tech.get(`/api/runs/${runId}/clips`)).json()).clips.map((c: { id: string; status: string }) => [c.id, c.status]);
    expect(listed).toContainEqual([body.clipId, "rejected"]);
    expect((await tech.post(`/api/clips/${body.clipId}/parts/sign`, { partNumbers: [1] })).status).toBe(404);
  });
});
