import { expect } from "vitest";
import type { DropView } from "@/lib/readings/view";
import type { Client } from "./app";
import { uploadFile, waitForClip } from "./clips";
import { demoOrganisationId } from "./fixtures";
import { newRun, newSample, newSubmission } from "./intake";
import { plainMp4 } from "./media";

// Drops ready to read, made through the real API: a run, a clip uploaded and processed, every drop placed.

export async function json<T = any>(res: Response, status: number): Promise<T> {
  const text = await res.text();
  expect(res.status, text).toBe(status);
  return JSON.parse(text) as T;
}

export async function placedDrops(c: Client, opts: { file?: string; startFrame?: number } = {}): Promise<{ runId: string; clipId: string; dropIds: string[] }> {
  const s = await newSubmission(c, await demoOrganisationId());
  const runId = (await newRun(c, (await newSample(c, s.id)).id)).id;
  return placeOnRun(c, runId, opts);
}

/** Uploads a clip to the run, waits until the worker has made it ready, and places every drop on it. */
export async function placeOnRun(
  c: Client,
  runId: string,
  opts: { file?: string; startFrame?: number } = {},
): Promise<{ runId: string; clipId: string; dropIds: string[] }> {
  const clip = await waitForClip(c, (await uploadFile(c, runId, opts.file ?? plainMp4())).clipId);
  expect(clip.status, clip.rejectReason ?? "").toBe("ready");
  const { drops } = await json<{ drops: DropView[] }>(await c.get(`/api/runs/${runId}/drops`), 200);
  for (const d of drops)
    await json(await c.request("PUT", `/api/drops/${d.id}/placement`, { json: { clipId: clip.id, startFrame: opts.startFrame ?? 0 } }), 200);
  return { runId, clipId: clip.id, dropIds: drops.map((d) => d.id) };
}

/** Starts (or continues) the reviewer's reading with these marks; returns the drop as they see it. */
export async function mark(c: Client, dropId: string, marks: { dispenseFrame?: number | null; clearFrame?: number | null }): Promise<DropView> {
  return (await json<{ drop: DropView }>(await c.post(`/api/drops/${dropId}/readings`, marks), 200)).drop;
}

export async function submit(c: Client, readingId: string): Promise<DropView> {
  return (await json<{ drop: DropView }>(await c.post(`/api/readings/${readingId}/submit`), 200)).drop;
}

/** Marks both frames and submits in one go. */
export async function read(c: Client, dropId: string, dispenseFrame: number, clearFrame: number): Promise<DropView> {
  const d = await mark(c, dropId, { dispenseFrame, clearFrame });
  return submit(c, d.myDraft!.id);
}
