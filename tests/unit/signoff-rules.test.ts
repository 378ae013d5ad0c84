import { describe, expect, it } from "vitest";
import { currentRevision, diffResults, lockReason, signRefusal } from "@/lib/signoff/rules";

// What a signature locks and what changed between two signed revisions (invented serials and times).
describe("sign-off lock", () => {
  it("locks while the revision in force is signed, and frees it once re-opened", () => {
    expect(lockReason({ reference: "S-1", signedRevisions: [], reopenedRevisions: [] })).toBeNull();
    expect(lockReason({ reference: "S-1", signedRevisions: [1], reopenedRevisions: [] })).toBe(
      "Submission S-1 is signed off (revision 1). A lead must re-open it first.",
    );
    expect(lockReason({ reference: "S-1", signedRevisions: [1], reopenedRevisions: [2] })).toBeNull();
    expect(currentRevision({ reopenedRevisions: [2, 3] })).toBe(3);
    expect(lockReason({ reference: "S-1", signedRevisions: [1, 2], reopenedRevisions: [2] })).toMatch(/revision 2/);
  });
});

describe("what changed since the previous signature", () => {
  const ball = (sampleId: string, mean: number | null, status: string) => ({ sampleId, serial: `B-${sampleId}`, mean, status });
  it("lists changed means and statuses, balls added and removed, and a changed decision", () => {
    const before = {
      balls: [ball("1", 150, "meets"), ball("2", 140, "close"), ball("3", 160, "meets")],
      decision: { decision: "close to limit — more samples" },
    };
    const after = { balls: [ball("1", 150, "meets"), ball("2", 146, "meets"), ball("4", 170, "meets")], decision: { decision: "meets limit" } };
    expect(diffResults(before, after)).toEqual({
      balls: [{ serial: "B-2", mean: { before: 140, after: 146 }, status: { before: "close", after: "meets" } }],
      ballsAdded: ["B-4"],
      ballsRemoved: ["B-3"],
      decision: { before: "close to limit — more samples", after: "meets limit" },
    });
  });
  it("is empty when nothing changed", () => {
    const same = { balls: [ball("1", 150, "meets")], decision: { decision: "meets limit" } };
    expect(diffResults(same, same)).toEqual({ balls: [], ballsAdded: [], ballsRemoved: [], decision: null });
  });
});

// Which staged decisions a lead can sign (the product's own rule, from the design of record's staged testing).
describe("what can be signed", () => {
  const d = (decision: string, ballCount = 2) =>
    signRefusal({ ballCount, decision, explanation: "Round 1 is not complete.", nextAction: "Request round 2: 8 more samples from the manufacturer." });
  it("signs a final decision, meets or below the limit", () => {
    expect(d("meets limit")).toBeNull();
    expect(d("below limit")).toBeNull();
  });
  it("refuses with no ball results, a pending decision, or one that asks for more samples", () => {
    expect(d("meets limit", 0)).toMatch(/no ball results yet/);
    expect(d("pending")).toBe("The decision is still pending. Round 1 is not complete. Results can be signed off once it is made.");
    expect(d("close to limit — more samples")).toBe(
      "The decision asks for more samples: Request round 2: 8 more samples from the manufacturer. Results can be signed off once the last round gives a final decision.",
    );
  });
});
