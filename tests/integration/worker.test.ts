import { randomBytes } from "node:crypto";
import { afterAll, describe, expect, it } from "vitest";
import { boss, enqueue, stopBoss } from "@/lib/jobs";

afterAll(() => stopBoss());

describe("background worker", () => {
  it("a separate worker process consumes a queued job", async () => {
    const id = await enqueue("ping", { token: randomBytes(4).toString("hex") });
    expect(id).toBeTruthy();
    const b = await boss();
    const end = Date.now() + 20_000;
    let state: string | undefined;
    while (Date.now() < end) {
      state = (await b.getJobById("ping", id!))?.state;
      if (state === "completed") break;
      await new Promise((r) => setTimeout(r, 200));
    }
    expect(state).toBe("completed");
  });
});
