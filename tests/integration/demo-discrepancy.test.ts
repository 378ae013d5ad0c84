import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb, db } from "@/lib/db";
import type { DropView } from "@/lib/readings/view";
import { readDisagreeing } from "@/seeds/demo-discrepancy";
import { signedIn, type Client } from "../helpers/app";
import { demo } from "../helpers/fixtures";
import { json, placedDrops } from "../helpers/readings";

// The demo's discrepancy, made by the two demo reviewers through the real reading services. The
// clip is 25 frames a second, so 30 frames later on the clear mark is 1.2 s, beyond the demo
// edition's 0.5 s reading tolerance.
let lead: Client;
let dropIds: string[];

beforeAll(async () => {
  lead = await signedIn(demo.email("lead"), demo.password);
  dropIds = (await placedDrops(await signedIn(demo.email("technician"), demo.password))).dropIds;
}, 120_000);
afterAll(() => closeDb());

describe("the demo discrepancy", () => {
  it("two demo readings 1.2 s apart put the drop among the lead's discrepancies, and a second call adds nothing", async () => {
    expect(await readDisagreeing(db(), dropIds[0], { dispenseFrame: 2, clearFrame: 12 }, 30)).toBe("discrepancy");
    const { drops } = await json<{ drops: DropView[] }>(await lead.get("/api/discrepancies"), 200);
    const mine = drops.find((d) => d.id === dropIds[0]);
    expect(Math.abs(mine?.comparison?.timeDifferenceS ?? 0)).toBeCloseTo(1.2, 6);
    expect(await readDisagreeing(db(), dropIds[0], { dispenseFrame: 2, clearFrame: 12 }, 30)).toBe("discrepancy");
    expect(await db()("readings").where({ drop_id: dropIds[0], status: "submitted" })).toHaveLength(2);
  });
});
