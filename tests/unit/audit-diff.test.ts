import { describe, expect, it } from "vitest";
import { diffRows, flatten } from "@/app/(lab)/audit/_components/diff-rows";
import { changeLines } from "@/app/(lab)/submissions/[id]/results/_components/change-lines";

describe("an audit event's before and after, field by field", () => {
  it("flattens nested records into dotted fields, lists of values joined, lists of records numbered", () => {
    expect([
      ...flatten({
        status: "released",
        weight: { value: 16, unit: "lb" },
        roles: ["lead", "reviewer"],
        balls: [{ serial: "A" }, { serial: "B" }],
        note: "",
        gone: null,
        none: [],
      }),
    ]).toEqual([
      ["status", "released"],
      ["weight.value", "16"],
      ["weight.unit", "lb"],
      ["roles", "lead, reviewer"],
      ["balls[1].serial", "A"],
      ["balls[2].serial", "B"],
      ["note", "(empty)"],
      ["gone", "—"],
      ["none", "(none)"],
    ]);
  });

  it("marks what changed, was added or removed only when there is both a before and an after", () => {
    expect(diffRows({ status: "testing", revision: 1, reason: "x" }, { status: "released", revision: 1, meaning: "results reviewed and released" })).toEqual([
      { key: "status", before: "testing", after: "released", change: "changed" },
      { key: "revision", before: "1", after: "1", change: null },
      { key: "reason", before: "x", after: null, change: "removed" },
      { key: "meaning", before: null, after: "results reviewed and released", change: "added" },
    ]);
    expect(diffRows(null, { state: "ruled" })).toEqual([{ key: "state", before: null, after: "ruled", change: null }]);
    expect(diffRows(null, null)).toEqual([]);
  });
});

describe("what changed between two signed revisions, in words", () => {
  it("names the decision, the balls added and removed, and each ball's changes", () => {
    expect(changeLines(null)).toEqual([]);
    expect(changeLines({ balls: [], ballsAdded: [], ballsRemoved: [], decision: null })).toEqual(["No change in the ball results or the decision."]);
    expect(
      changeLines({
        balls: [
          { serial: "SO-1", mean: { before: 1.2, after: 1.25 }, status: { before: "close", after: "meets" } },
          { serial: "SO-4", mean: { before: 1.21, after: 1.24 }, status: null },
        ],
        ballsAdded: ["SO-3"],
        ballsRemoved: ["SO-2"],
        decision: { before: "close to limit — more samples", after: "meets limit" },
      }),
    ).toEqual([
      "Decision: close to limit — more samples → meets limit",
      "Balls added: SO-3",
      "Balls removed: SO-2",
      "Ball SO-1: mean 1.2 s → 1.3 s, status close → meets",
      "Ball SO-4: mean 1.210 s → 1.240 s",
    ]);
  });
});
