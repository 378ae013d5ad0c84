import { readFile, stat } from "node:fs/promises";
import { expect } from "vitest";
import type { TrimSource } from "@/lib/clips/schema";
import type { ClipView } from "@/lib/clips/view";
import type { Client } from "./app";

// Uploads a file the way the browser does: start, sign parts, PUT each part straight to storage,
// record its ETag, complete. `stopAfter` leaves the upload unfinished after that many parts.
export async function uploadFile(
  c: Client,
  runId: string,
  file: string,
  opts: { name?: string; stopAfter?: number; type?: string; trim?: TrimSource } = {},
): Promise<{ clipId: string; partCount: number }> {
  const size = (await stat(file)).size;
  const start = await c.post(`/api/runs/${runId}/clips`, {
    fileName: opts.name ?? file.split("/").pop(),
    size,
    contentType: opts.type ?? "video/mp4",
    ...(opts.trim ? { trim: opts.trim } : {}),
  });
  const startText = await start.text();
  expect(start.status, startText).toBe(201);
  const plan = JSON.parse(startText) as { clipId: string; partSize: number; partCount: number };
  await sendParts(
    c,
    plan.clipId,
    file,
    plan,
    Array.from({ length: Math.min(plan.partCount, opts.stopAfter ?? plan.partCount) }, (_, i) => i + 1),
  );
  if (opts.stopAfter === undefined) await complete(c, plan.clipId);
  return { clipId: plan.clipId, partCount: plan.partCount };
}

export async function sendParts(c: Client, clipId: string, file: string, plan: { partSize: number }, partNumbers: number[]): Promise<void> {
  if (partNumbers.length === 0) return;
  const bytes = await readFile(file);
  const signed = await (await c.post(`/api/clips/${clipId}/parts/sign`, { partNumbers })).json();
  for (const { partNumber, url } of signed.urls as { partNumber: number; url: string }[]) {
    const body = bytes.subarray((partNumber - 1) * plan.partSize, partNumber * plan.partSize);
    const put = await fetch(url, { method: "PUT", body });
    expect(put.status).toBe(200);
    const etag = put.headers.get("etag")!;
    const rec = await c.request("PUT", `/api/clips/${clipId}/parts/${partNumber}`, { json: { etag, size: body.length } });
    expect(rec.status).toBe(200);
  }
}

export async function complete(c: Client, clipId: string): Promise<{ status: string }> {
  const res = await c.post(`/api/clips/${clipId}/complete`);
  const text = await res.text();
  expect(res.status, text).toBe(200);
  return JSON.parse(text);
}

/** Polls the clip until it leaves processing (ready, rejected or failed). */
export async function waitForClip(c: Client, clipId: string, timeoutMs = 90_000): Promise<ClipView> {
  const end = Date.now() + timeoutMs;
  for (;;) {
    const clip = (await (await c.get(`/api/clips/${clipId}`)).json()).clip as ClipView;
    if (clip.status !== "processing" && clip.status !== "uploading") return clip;
    if (Date.now() > end) throw new Error(`clip ${clipId} still ${clip.status} after ${timeoutMs} ms: ${JSON.stringify(clip.steps)}`);
    await new Promise((r) => setTimeout(r, 300));
  }
}
