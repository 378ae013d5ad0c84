import { describe, expect, it } from "vitest";
import { isAbort, PartError, sendFile, type Network, type Progress, type Transport, type UploadState } from "@/lib/uploads/browser/multipart";
import { SignedUrls } from "@/lib/uploads/browser/signed-urls";
import { SpeedMeter } from "@/lib/uploads/browser/speed";

// A fake server and store: which parts are recorded, what was PUT, and failures on demand.
function fakeServer(size: number, partSize: number, opts: { recorded?: number[]; failPut?: (n: number, attempt: number) => Error | null } = {}) {
  const partCount = Math.ceil(size / partSize);
  const recorded = new Map<number, number>((opts.recorded ?? []).map((n) => [n, Math.min(partSize, size - (n - 1) * partSize)]));
  const puts: number[] = [];
  const started: number[] = [];
  const signed: number[][] = [];
  const tries = new Map<number, number>();
  let inFlight = 0;
  let maxInFlight = 0;
  let completed = false;
  const transport: Transport = {
    state: async (): Promise<UploadState> => ({
      status: completed ? "processing" : "uploading",
      size,
      partSize,
      partCount,
      parts: [...recorded].map(([partNumber, s]) => ({ partNumber, size: s })),
    }),
    sign: async (_id, nums) => {
      signed.push(nums);
      return nums.map((n) => ({ partNumber: n, url: `store://part/${n}` }));
    },
    put: async (url, body, onSent, signal) => {
      const n = Number(url.split("/").pop());
      started.push(n);
      const attempt = (tries.get(n) ?? 0) + 1;
      tries.set(n, attempt);
      inFlight++;
      maxInFlight = Math.max(maxInFlight, inFlight);
      try {
        await new Promise((r) => setTimeout(r, 2));
        if (signal.aborted) throw new DOMException("aborted", "AbortError");
        const fail = opts.failPut?.(n, attempt);
        if (fail) throw fail;
        onSent(body.size);
        puts.push(n);
        return `"etag-${n}"`;
      } finally {
        inFlight--;
      }
    },
    record: async (_id, n, etag, s) => {
      expect(etag).toBe(`"etag-${n}"`);
      recorded.set(n, s);
    },
    complete: async () => {
      const missing = Array.from({ length: partCount }, (_, i) => i + 1).filter((n) => !recorded.has(n));
      if (missing.length) throw Object.assign(new Error(`parts ${missing.join(", ")} still to send`), { status: 409 });
      completed = true;
      return { status: "processing" };
    },
  };
  return {
    transport,
    recorded,
    puts,
    started,
    signed,
    tries,
    get maxInFlight() {
      return maxInFlight;
    },
    get completed() {
      return completed;
    },
  };
}

const file = (bytes: number) => new Blob([new Uint8Array(bytes)]);
const fast = { backoffMs: () => 1 };

describe("sendFile", () => {
  it("sends every part three at a time, with the right byte ranges, then completes", async () => {
    const s = fakeServer(23, 5);
    const progress: number[] = [];
    const out = await sendFile({
      clipId: "c",
      file: file(23),
      transport: s.transport,
      signal: new AbortController().signal,
      onProgress: (p) => progress.push(p.sentBytes),
    });
    expect(out.status).toBe("processing");
    expect([...s.recorded.entries()].sort((a, b) => a[0] - b[0])).toEqual([
      [1, 5],
      [2, 5],
      [3, 5],
      [4, 5],
      [5, 3],
    ]);
    expect(s.maxInFlight).toBe(3);
    expect(progress.at(-1)).toBe(23);
    // Signed in one batch for the part wanted and the queue behind it.
    expect(s.signed[0]).toEqual([1, 2, 3, 4, 5]);
  });

  it("resumes from the server's record: only the missing parts are sent", async () => {
    const s = fakeServer(20, 5, { recorded: [1, 3] });
    await sendFile({ clipId: "c", file: file(20), transport: s.transport, signal: new AbortController().signal });
    expect(s.puts.sort()).toEqual([2, 4]);
    expect(s.completed).toBe(true);
  });

  it("retries a failed part with backoff and keeps the parts already recorded", async () => {
    const waits: number[] = [];
    const s = fakeServer(15, 5, { failPut: (n, attempt) => (n === 2 && attempt < 3 ? new PartError("Storage answered 503 to a part.", true, 503) : null) });
    await sendFile({ clipId: "c", file: file(15), transport: s.transport, signal: new AbortController().signal, backoffMs: (a) => (waits.push(a), 1) });
    expect(s.tries.get(2)).toBe(3);
    expect(waits).toEqual([1, 2]);
    expect(s.completed).toBe(true);
  });

  it("gives up on a part after the last try and says which, without completing", async () => {
    const s = fakeServer(15, 5, { failPut: (n) => (n === 3 ? new PartError("The connection to storage was lost.", true) : null) });
    await expect(
      sendFile({ clipId: "c", file: file(15), transport: s.transport, signal: new AbortController().signal, maxAttempts: 3, ...fast }),
    ).rejects.toThrow(/Part 3 of 3 could not be sent after 3 tries \(The connection to storage was lost\.\)/);
    expect([...s.recorded.keys()].sort()).toEqual([1, 2]);
    expect(s.completed).toBe(false);
  });

  it("does not retry what cannot succeed (a refusal)", async () => {
    const s = fakeServer(10, 5, { failPut: () => new PartError("Storage answered 400 to a part.", false, 400) });
    await expect(sendFile({ clipId: "c", file: file(10), transport: s.transport, signal: new AbortController().signal, ...fast })).rejects.toThrow(/400/);
    expect(s.tries.get(1)).toBe(1);
  });

  it("waits while offline without using up tries, then carries on", async () => {
    let online = false;
    let wake: () => void = () => {};
    const network: Network = { isOnline: () => online, whenOnline: () => new Promise<void>((r) => (wake = r)) };
    const s = fakeServer(10, 5, {
      failPut: (n, attempt) => (n === 1 && attempt <= 4 && !online ? new PartError("The connection to storage was lost.", true) : null),
    });
    const states: string[] = [];
    const done = sendFile({
      clipId: "c",
      file: file(10),
      transport: s.transport,
      signal: new AbortController().signal,
      network,
      maxAttempts: 2,
      ...fast,
      onProgress: (p) => p.waiting && states.push(p.waiting.kind),
    });
    await new Promise((r) => setTimeout(r, 20));
    expect(states).toContain("offline");
    online = true;
    wake();
    await done;
    expect(s.completed).toBe(true);
  });

  it("stopping (leaving the page) drops the parts in flight, keeps the recorded ones, and a new start sends the rest", async () => {
    const s = fakeServer(40, 5);
    const ctl = new AbortController();
    const run = sendFile({ clipId: "c", file: file(40), transport: s.transport, signal: ctl.signal, onProgress: (p) => p.partsDone >= 2 && ctl.abort() });
    const err = await run.catch((e) => e);
    expect(isAbort(err)).toBe(true);
    const kept = s.recorded.size;
    expect(kept).toBeGreaterThanOrEqual(2);
    expect(kept).toBeLessThan(8);
    expect(s.completed).toBe(false);
    await sendFile({ clipId: "c", file: file(40), transport: s.transport, signal: new AbortController().signal });
    expect(s.recorded.size).toBe(8);
    expect(s.completed).toBe(true);
  });

  it("pausing starts no new part and finishes the parts in flight: everything sent is stored, and a new start sends the rest", async () => {
    const s = fakeServer(40, 5);
    const pause = new AbortController();
    const seen: Progress[] = [];
    let startedAtPause = -1;
    const err = await sendFile({
      clipId: "c",
      file: file(40),
      transport: s.transport,
      signal: new AbortController().signal,
      pause: pause.signal,
      onProgress: (p) => {
        seen.push(p);
        if (p.partsDone >= 2 && !pause.signal.aborted) {
          startedAtPause = s.started.length;
          expect(p.partsInFlight).toBeGreaterThan(0);
          pause.abort();
        }
      },
    }).catch((e) => e);
    expect(isAbort(err)).toBe(true);
    expect(startedAtPause).toBeGreaterThan(2);
    expect(s.started.length).toBe(startedAtPause);
    expect(s.recorded.size).toBe(startedAtPause);
    // What the last report says is stored is all that was sent, and it never went down on the way.
    const last = seen.at(-1)!;
    expect([last.storedBytes, last.sentBytes, last.partsInFlight]).toEqual([startedAtPause * 5, startedAtPause * 5, 0]);
    const stored = seen.map((p) => p.storedBytes);
    expect(stored).toEqual([...stored].sort((a, b) => a - b));
    await sendFile({ clipId: "c", file: file(40), transport: s.transport, signal: new AbortController().signal });
    expect(s.puts.length).toBe(8);
    expect(s.completed).toBe(true);
  });

  it("pausing ends a wait for another try at once, keeps the stored parts, and leaves the failed part for the next start", { timeout: 2000 }, async () => {
    const s = fakeServer(15, 5, { failPut: (n, attempt) => (n === 2 && attempt === 1 ? new PartError("Storage answered 503 to a part.", true, 503) : null) });
    const pause = new AbortController();
    const err = await sendFile({
      clipId: "c",
      file: file(15),
      transport: s.transport,
      signal: new AbortController().signal,
      pause: pause.signal,
      backoffMs: () => 60_000,
      onProgress: (p) => p.waiting?.kind === "retry" && pause.abort(),
    }).catch((e) => e);
    expect(isAbort(err)).toBe(true);
    expect([...s.recorded.keys()].sort()).toEqual([1, 3]);
    expect(s.tries.get(2)).toBe(1);
    expect(s.completed).toBe(false);
  });

  it("refuses a file of another size than the one started", async () => {
    const s = fakeServer(10, 5);
    await expect(sendFile({ clipId: "c", file: file(11), transport: s.transport, signal: new AbortController().signal })).rejects.toThrow(/pick the same file/);
  });

  it("answers at once when the upload is already complete", async () => {
    const s = fakeServer(10, 5, { recorded: [1, 2] });
    await s.transport.complete("c");
    expect(await sendFile({ clipId: "c", file: file(10), transport: s.transport, signal: new AbortController().signal })).toEqual({ status: "processing" });
    expect(s.puts).toEqual([]);
  });
});

describe("SignedUrls", () => {
  it("signs in batches, reuses fresh URLs, and signs again after 45 minutes or when told to forget", async () => {
    let now = 0;
    const asked: number[][] = [];
    const urls = new SignedUrls(
      async (nums) => (asked.push(nums), nums.map((n) => ({ partNumber: n, url: `u${n}@${now}` }))),
      () => now,
    );
    expect(await urls.get(1, [2, 3])).toBe("u1@0");
    expect(await urls.get(2, [3])).toBe("u2@0");
    expect(asked).toEqual([[1, 2, 3]]);
    urls.forget(3);
    expect(await urls.get(3, [])).toBe("u3@0");
    now = 46 * 60_000;
    expect(await urls.get(2, [])).toBe(`u2@${now}`);
    expect(asked.length).toBe(3);
  });
});

describe("SpeedMeter", () => {
  it("measures over the last seconds and estimates the time left", () => {
    const m = new SpeedMeter();
    m.add(0, 0);
    expect(m.bytesPerSecond()).toBeNull();
    m.add(1000, 2_000_000);
    m.add(2000, 4_000_000);
    expect(m.bytesPerSecond()).toBe(2_000_000);
    expect(m.secondsLeft(10_000_000)).toBe(3);
    // A part that failed takes its bytes back: the window starts again.
    m.add(2500, 3_000_000);
    expect(m.bytesPerSecond()).toBeNull();
  });
});
