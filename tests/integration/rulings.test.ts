import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb, db } from "@/lib/db";
import type { DropView } from "@/lib/readings/view";
import type { RulingView } from "@/lib/rulings/view";
import { signedIn, type Client } from "../helpers/app";
import { demo, makeUser } from "../helpers/fixtures";
import { json, placedDrops, read } from "../helpers/readings";

// A lead settles a discrepancy through the real API. The clip is 25 frames a second, so two readers
// 30 frames apart on the clear mark differ by 1.2 s, beyond the demo edition's 0.5 s tolerance.
let lead: Client;
let otherLead: Client;
let tech: Client;
let a: Client;
let b: Client;
let dropIds: string[];
let party: Client;

const disagree = async (dropId: string, second: Client = b) => {
  await read(a, dropId, 2, 12);
  const d = await read(second, dropId, 2, 42);
  expect(d.state).toBe("discrepancy");
};
const rule = (c: Client, dropId: string, body: unknown) => c.post(`/api/drops/${dropId}/ruling`, body);
const message = async (res: Response, status: number) => (await json<{ error: { message: string } }>(res, status)).error.message;

beforeAll(async () => {
  lead = await signedIn(demo.email("lead"), demo.password);
  tech = await signedIn(demo.email("technician"), demo.password);
  const [ua, ub, ul] = [await makeUser(["reviewer"]), await makeUser(["reviewer"]), await makeUser(["lead"])];
  [a, b, otherLead] = [await signedIn(ua.email, ua.password), await signedIn(ub.email, ub.password), await signedIn(ul.email, ul.password)];
  // A lead who also reads drops, and gives one of the two readings.
  const leadReader = await makeUser(["lead", "reviewer"]);
  party = await signedIn(leadReader.email, leadReader.password);
  // Two runs of three drops: three discrepancies, and one drop left unread.
  dropIds = [...(await placedDrops(lead)).dropIds, ...(await placedDrops(lead)).dropIds];
  await disagree(dropIds[0]);
  await disagree(dropIds[1]);
  await disagree(dropIds[2], party);
}, 120_000);
afterAll(() => closeDb());

describe("a lead rules on a discrepancy", () => {
  it("accepting the second reading sets the drop's time to it, with the reason, and leaves both readings as they were", async () => {
    const before = (await json<{ drop: DropView }>(await lead.get(`/api/drops/${dropIds[0]}`), 200)).drop;
    const second = before.readings.find((r) => r.slot === 2)!;
    const { ruling } = await json<{ ruling: RulingView }>(
      await rule(lead, dropIds[0], { chosen: "second", reason: "The first reader marked the clear frame before the film had gone." }),
      201,
    );
    expect(ruling).toMatchObject({ chosen: "second", readingId: second.id, timeS: second.timeS });
    expect(ruling.timeS).toBeCloseTo(40 / 25, 9); // frames 2 → 42 at 25 frames a second
    const after = (await json<{ drop: DropView }>(await lead.get(`/api/drops/${dropIds[0]}`), 200)).drop;
    expect(after.state).toBe("ruled");
    expect(after.readings.map(({ id, dispenseFrame, clearFrame, timeS }) => ({ id, dispenseFrame, clearFrame, timeS }))).toEqual(
      before.readings.map(({ id, dispenseFrame, clearFrame, timeS }) => ({ id, dispenseFrame, clearFrame, timeS })),
    );
    const row = await db()("drops").where({ id: dropIds[0] }).first();
    expect(row.agreed_time_s).toBe(second.timeS);
    const events = await db()("audit_events").where({ entity: "ruling", entity_id: ruling.id });
    expect(events.map((e) => e.action)).toEqual(["ruling.made"]);
    expect((await json<{ ruling: RulingView }>(await tech.get(`/api/drops/${dropIds[0]}/ruling`), 200)).ruling.reason).toMatch(/clear frame/);
  });

  it("a third reading is looked up in the clip's frame index and becomes the drop's time", async () => {
    const { ruling } = await json<{ ruling: RulingView }>(
      await rule(lead, dropIds[1], {
        chosen: "third",
        dispenseFrame: 2,
        clearFrame: 27,
        reason: "Read again frame by frame: neither reading's clear mark holds.",
      }),
      201,
    );
    expect(ruling.timeS).toBeCloseTo(25 / 25, 9);
    const third = await db()("readings").where({ id: ruling.readingId }).first();
    expect(third).toMatchObject({ slot: 3, status: "submitted", dispense_frame: 2, clear_frame: 27 });
    expect((await db()("drops").where({ id: dropIds[1] }).first()).state).toBe("ruled");
  });

  it("is refused, in words, without a reason, to a non-lead, twice, on a drop not in discrepancy, and to a lead who read it", async () => {
    expect(await message(await rule(otherLead, dropIds[2], { chosen: "first", reason: "" }), 422)).toBe("Please correct the form. Reason is required.");
    const short = await rule(otherLead, dropIds[2], { chosen: "first", reason: "too short" });
    expect(JSON.stringify(await short.json())).toMatch(/at least 10 characters/);
    expect(await message(await rule(tech, dropIds[2], { chosen: "first", reason: "A technician's attempt at a ruling." }), 403)).toMatch(/lead/);
    expect(await message(await rule(lead, dropIds[0], { chosen: "first", reason: "A second ruling on the same drop." }), 409)).toMatch(/already ruled/);
    expect(await message(await rule(lead, dropIds[3], { chosen: "first", reason: "This drop has not been read at all." }), 409)).toMatch(/unread/);
    expect(await message(await rule(party, dropIds[2], { chosen: "second", reason: "I read it and think I was right." }), 403)).toMatch(
      /another lead must rule/,
    );
    expect(await message(await rule(otherLead, dropIds[2], { chosen: "third", reason: "Third reading without its marks." }), 422)).toBe(
      "Please correct the form. Mark the dispense frame of the third reading. Mark the clear frame of the third reading.",
    );
    expect((await db()("drops").where({ id: dropIds[2] }).first()).state).toBe("discrepancy");
    await json(await rule(otherLead, dropIds[2], { chosen: "first", reason: "The first reader's clear frame is where the film is gone." }), 201);
  });
});
