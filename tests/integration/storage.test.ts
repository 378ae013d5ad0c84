import { createHash, randomBytes } from "node:crypto";
import { describe, expect, it } from "vitest";
import { getObjectStream, headObject, presignGet, putObject, sha256OfStream } from "@/lib/storage";

describe("object storage (S3 API against the local fake)", () => {
  const body = randomBytes(3 * 1024 * 1024 + 17);
  const key = `tests/storage/${randomBytes(6).toString("hex")}.bin`;
  const sha = (b: Uint8Array) => createHash("sha256").update(b).digest("hex");

  it("stores an object byte for byte and streams it back with a matching SHA-256", async () => {
    await putObject(key, body, "application/octet-stream");
    expect((await headObject(key)).size).toBe(body.length);
    expect(await sha256OfStream(await getObjectStream(key))).toBe(sha(body));
  });

  it("serves a byte range through a presigned GET URL", async () => {
    const url = await presignGet(key, 60);
    expect(url).not.toMatch(/x-amz-checksum/i);
    const res = await fetch(url, { headers: { Range: "bytes=1000-1999" } });
    expect(res.status).toBe(206);
    const part = new Uint8Array(await res.arrayBuffer());
    expect(part.length).toBe(1000);
    expect(sha(part)).toBe(sha(body.subarray(1000, 2000)));
    const whole = new Uint8Array(await (await fetch(url)).arrayBuffer());
    expect(sha(whole)).toBe(sha(body));
  });

  it("streams an open-ended range from the data layer", async () => {
    const tail = await sha256OfStream(await getObjectStream(key, { start: body.length - 17 }));
    expect(tail).toBe(sha(body.subarray(body.length - 17)));
  });
});
