import { describe, expect, it } from "vitest";
import { editionInBrief } from "@/lib/editions/words";

describe("an edition in one sentence", () => {
  it("says one drop in the singular and names the rule for a ball below the minimum", () => {
    const e = { name: "Edition X (invented)", dropsPerBall: 1, minAbsorptionS: 135, belowMinimumRule: "fails" as const };
    expect(editionInBrief(e)).toBe(
      "Edition X (invented): 1 drop per ball, at least 135 s absorption time; a ball below the minimum fails the submission on its own.",
    );
    expect(editionInBrief({ ...e, dropsPerBall: 3, belowMinimumRule: "reported" })).toBe(
      "Edition X (invented): 3 drops per ball, at least 135 s absorption time; a ball below the minimum is reported; the rounds and the tolerance limit decide.",
    );
  });
});
