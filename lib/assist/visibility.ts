// Who sees the reading assist of a drop: the independence rule. Pure, browser-safe.
//
// A second reading that saw a suggestion is no longer an independent check of the first, so the
// specification edition chooses who sees the assist:
// - "first_reader_before" (the default): the drop's first reader sees it before marking; the
//   second reader does not see it until both readings are in;
// - "after_own_marks": each reader sees it once their own reading is submitted;
// - "nobody": it is shown to no one (it is still measured, for the assist-versus-reader study).
// Someone who does not read drops (a lead or technician without the reviewer role) is never blind,
// so sees it unless the edition says nobody.

export const ASSIST_VISIBILITIES = ["first_reader_before", "after_own_marks", "nobody"] as const;
export type AssistVisibility = (typeof ASSIST_VISIBILITIES)[number];

export const ASSIST_VISIBILITY_LABELS: Record<AssistVisibility, string> = {
  first_reader_before: "The first reader before marking; the second reader only once both readings are in",
  after_own_marks: "Each reader once their own reading is submitted",
  nobody: "Nobody",
};

export interface AssistSeat {
  visibility: AssistVisibility;
  viewerId: string;
  /** Whether the viewer reads drops (holds the reviewer role): only readers can be blind. */
  viewerReads: boolean;
  /** Both current readings of the drop are submitted. */
  bothReadingsIn: boolean;
  /** The viewer's own current reading is submitted. */
  ownSubmitted: boolean;
  /**
   * The drop's first reader: the reviewer who first saw its assist or started a reading of it,
   * whichever came first; null while nobody has.
   */
  firstReaderId: string | null;
}

export interface AssistDecision {
  visible: boolean;
  /** In words, for the reading page when the assist is hidden. */
  reason: string;
}

export function assistDecision(s: AssistSeat): AssistDecision {
  if (s.visibility === "nobody") return { visible: false, reason: "The edition shows the assist to nobody." };
  if (!s.viewerReads || s.bothReadingsIn) return { visible: true, reason: "" };
  if (s.visibility === "after_own_marks") {
    return s.ownSubmitted
      ? { visible: true, reason: "" }
      : { visible: false, reason: "The edition shows the assist to each reader once their own reading is submitted." };
  }
  if (s.firstReaderId === null || s.firstReaderId === s.viewerId) return { visible: true, reason: "" };
  return {
    visible: false,
    reason:
      "You are this drop's second reader: the edition keeps the assist from you until both readings are in, so that your reading stays an independent check.",
  };
}

/** Whether showing the assist now makes the viewer the drop's first reader (nobody is yet). */
export function claimsFirstReader(s: AssistSeat): boolean {
  return s.visibility === "first_reader_before" && s.viewerReads && !s.bothReadingsIn && s.firstReaderId === null;
}
