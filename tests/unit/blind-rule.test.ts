import { describe, expect, it } from "vitest";
import type { Actor } from "@/lib/auth/actor";
import type { DropRow } from "@/lib/drops/queries";
import { canSeeReading, isBlindFor } from "@/lib/readings/policy";
import type { ReadingRow } from "@/lib/readings/queries";
import { toDropView } from "@/lib/readings/view";
import type { Role } from "@/lib/users/rules";

// The blind rule: until a drop has two current readings (submitted, not replaced by a submitted
// correction), anyone holding the reviewer role sees only their own reading, without its slot, and
// not the drop's state or comparison. Leads without the reviewer role and technicians always see all.
const actor = (id: string, ...roles: Role[]): Actor => ({ id, email: `${id}@lab.test`, name: id, roles, organisationId: null, requestId: "r" });
const A = actor("rev-a", "reviewer");
const B = actor("rev-b", "reviewer");
const C = actor("rev-c", "reviewer");
const LEAD_READER = actor("lead-r", "lead", "reviewer");
const LEAD = actor("lead", "lead");
const TECH = actor("tech", "technician");

const at = new Date("2026-03-01T10:00:00Z");
let seq = 0;
function reading(reviewer: Actor, slot: number, over: Partial<ReadingRow> = {}): ReadingRow {
  return {
    id: `g${++seq}`,
    dropId: "d1",
    clipId: "c1",
    reviewerId: reviewer.id,
    reviewerName: reviewer.name,
    slot,
    status: "submitted",
    supersedesId: null,
    correctionReason: null,
    createdAt: at,
    updatedAt: at,
    submittedAt: at,
    dispenseFrame: 10,
    clearFrame: 40,
    dispensePts: 10_000,
    clearPts: 40_000,
    timeS: 1.2,
    uncertaintyStandardS: 0.01,
    uncertaintyExpandedS: 0.02,
    ...over,
  } as ReadingRow;
}
const drop = (over: Partial<DropRow> = {}): DropRow => ({
  id: "d1",
  runId: "run1",
  ordinal: 1,
  clipId: "c1",
  startFrame: 0,
  placedBy: "tech",
  placedByName: "tech",
  placedAt: at,
  state: "read once",
  stateChangedAt: at,
  agreedTimeS: null,
  timeDifferenceS: null,
  dispenseDifferenceS: null,
  clearDifferenceS: null,
  clipName: "clip.mp4",
  clipStatus: "ready",
  clipRejectReason: null,
  sampleId: "s1",
  sampleSerial: "B1",
  submissionId: "sub1",
  submissionReference: "D-1",
  organisationId: "o1",
  readingToleranceS: 0.5,
  timeBase: { num: 1, den: 1000 },
  ...over,
});
const agreed = (): Partial<DropRow> => ({ state: "agreed", agreedTimeS: 1.2, timeDifferenceS: 0, dispenseDifferenceS: 0, clearDifferenceS: 0 });

describe("isBlindFor", () => {
  it("keeps anyone holding the reviewer role blind with 0 and 1 current readings, and not with 2", () => {
    for (const who of [A, LEAD_READER]) {
      expect([0, 1, 2].map((n) => isBlindFor(who, n))).toEqual([true, true, false]);
    }
  });

  it("never blinds a lead without the reviewer role, or a technician", () => {
    for (const who of [LEAD, TECH]) expect([0, 1, 2].map((n) => isBlindFor(who, n))).toEqual([false, false, false]);
  });
});

describe("canSeeReading", () => {
  const mine = { reviewerId: A.id };
  const theirs = { reviewerId: B.id };
  it("shows a blind reader only their own reading", () => {
    expect(canSeeReading(A, mine, true)).toBe(true);
    expect(canSeeReading(A, theirs, true)).toBe(false);
  });
  it("shows every reading once the reader is not blind", () => {
    expect(canSeeReading(A, mine, false)).toBe(true);
    expect(canSeeReading(A, theirs, false)).toBe(true);
  });
});

describe("toDropView under the blind rule", () => {
  it("with no reading: a reviewer is blind and sees no state; a lead sees the state", () => {
    const d = drop({ state: "unread" });
    const v = toDropView(A, d, []);
    expect(v).toMatchObject({ blind: true, state: null, stateChangedAt: null, comparison: null, readings: [], myDraft: null, mySubmitted: null });
    expect(toDropView(LEAD, d, [])).toMatchObject({ blind: false, state: "unread", stateChangedAt: at.toISOString() });
  });

  it("with one current reading: its reader sees it without its slot; the other reviewer sees nothing of it", () => {
    const second = 2; // A fills slot 2: a blind reader must not learn that a first exists.
    const ra = reading(A, second);
    const draftB = reading(B, 1, { status: "draft", submittedAt: null, clearFrame: null, clearPts: null, timeS: null });
    const all = [ra, draftB];
    const own = toDropView(A, drop(), all);
    expect(own.blind).toBe(true);
    expect(own.state).toBeNull();
    expect(own.readings.map((r) => [r.id, r.slot])).toEqual([[ra.id, null]]);
    expect(own.mySubmitted).toMatchObject({ id: ra.id, slot: null });

    const other = toDropView(B, drop(), all);
    expect(other.blind).toBe(true);
    expect(other.readings.map((r) => [r.id, r.slot])).toEqual([[draftB.id, null]]);
    expect(other.myDraft).toMatchObject({ id: draftB.id, slot: null });
    expect(other.mySubmitted).toBeNull();

    // A third reviewer, and a lead who also reviews, see neither reading.
    expect(toDropView(C, drop(), all).readings).toEqual([]);
    expect(toDropView(LEAD_READER, drop(), all)).toMatchObject({ blind: true, state: null, readings: [] });
    // A lead without the reviewer role and a technician see both, with their slots, and the state.
    for (const who of [LEAD, TECH]) {
      const v = toDropView(who, drop(), all);
      expect(v).toMatchObject({ blind: false, state: "read once" });
      expect(v.readings.map((r) => [r.id, r.slot])).toEqual([
        [ra.id, 2],
        [draftB.id, 1],
      ]);
    }
  });

  it("a corrected reading and its correction are still one current reading: still blind", () => {
    const first = reading(A, 1);
    const correction = reading(A, 1, { supersedesId: first.id, correctionReason: "Clear frame was one too early." });
    const v = toDropView(A, drop(), [first, correction]);
    expect(v.blind).toBe(true);
    expect(v.readings.every((r) => r.slot === null)).toBe(true);
    expect(v.mySubmitted?.id).toBe(correction.id);
    expect(toDropView(B, drop(), [first, correction]).readings).toEqual([]);
  });

  it("with two current readings: every reviewer sees both readings, their slots, the state and the comparison", () => {
    const ra = reading(A, 1);
    const rb = reading(B, 2);
    for (const who of [A, B, C, LEAD_READER, LEAD, TECH]) {
      const v = toDropView(who, drop(agreed()), [ra, rb]);
      expect(v).toMatchObject({ blind: false, state: "agreed", comparison: { agreedTimeS: 1.2, timeDifferenceS: 0 } });
      expect(v.readings.map((r) => [r.id, r.slot])).toEqual([
        [ra.id, 1],
        [rb.id, 2],
      ]);
    }
    expect(toDropView(B, drop(agreed()), [ra, rb]).mySubmitted?.id).toBe(rb.id);
  });

  it("a lead who is also a reviewer is blind on a drop read once even when the lead has not read it", () => {
    const v = toDropView(LEAD_READER, drop(agreed()), [reading(A, 1)]);
    expect(v).toMatchObject({ blind: true, state: null, comparison: null, readings: [] });
  });
});
