// When a mark may be saved: only on a paused frame that the browser proved it painted. Pure, so the
// mark buttons, the mark keys and the words beside them all ask the same question.
import type { PlayerStatus } from "./frame-seeker";

export type MarkCheck = { ok: true; frame: number } | { ok: false; reason: string };

export interface MarkState {
  status: PlayerStatus;
  /** The frame proven on screen, if any. */
  frame: number | null;
  /** Whether the media element itself is paused. */
  paused: boolean;
}

export const MARK_REASONS = {
  playing: "Pause first: a mark is saved only on a paused frame the player has confirmed.",
  seeking: "Wait a moment: the player is still moving to the frame.",
  loading: "Wait a moment: the clip is still loading.",
  unconfirmed: "The picture on screen could not be matched to a frame of the index: step or try the frame again first.",
} as const;

/**
 * A frame counts only when the seeker confirmed it after a seek (not a frame matched while
 * playing, which is already gone when the mark arrives) and the media element is still paused.
 */
export function markCheck(s: MarkState): MarkCheck {
  if (s.status === "playing" || (s.status === "confirmed" && !s.paused)) return { ok: false, reason: MARK_REASONS.playing };
  if (s.status === "confirmed") return s.frame === null ? { ok: false, reason: MARK_REASONS.seeking } : { ok: true, frame: s.frame };
  return { ok: false, reason: MARK_REASONS[s.status] };
}
