import type { ReactNode, Ref } from "react";
import type { PlayerStatus } from "./frame-seeker";
import type { MarkCheck } from "./mark-rule";

export type { MarkCheck, PlayerStatus };

export interface PlayerMark {
  frame: number;
  label: string;
  kind: "dispense" | "clear" | "other";
}

export interface PlayerFrames {
  pts: number[];
  timeBase: { num: number; den: number };
  nominalRate: string | null;
  /** A variable-rate clip has no meaningful timecode: frames are not counted at the nominal rate. */
  variableRate?: boolean;
  keyframes?: number[];
}

export interface PlayerKey {
  /** A KeyboardEvent.key value, optionally with modifiers: "d", "Enter", "Shift+D". */
  key: string;
  label: string;
  run: () => void;
}

/** What a caller may ask of a mounted player through `controlRef`. */
export interface FramePlayerControl {
  /** The paused frame proven to be on screen now, or null while loading, seeking, playing or unconfirmed. */
  confirmedFrame(): number | null;
  /** Whether a mark may be saved now (`markCheck` in mark-rule.ts): the frame, or why not in words. */
  markCheck(): MarkCheck;
  goToFrame(frame: number): void;
  focus(): void;
}

export interface FrameChange {
  /** The frame on screen when known; null while seeking or when the picture is not matched. */
  frame: number | null;
  /** True only on a paused frame matched to `frame` of the index: marks may be saved. */
  confirmed: boolean;
  /** Why marks may not be saved now, in words (null when they may). */
  refusal: string | null;
}

export interface FramePlayerProps {
  src: string;
  poster?: string | null;
  /** Accessible name of the player, e.g. the clip's file name. */
  title: string;
  frames: PlayerFrames;
  offsetPts: number;
  /** Where to open, e.g. the technician's approximate start of a drop. */
  initialFrame?: number;
  /** Drawn on the scrubber; the dispense mark also drives "time since dispense" and the compare view. */
  marks?: PlayerMark[];
  filmstrip?: { url: string; tiles: number } | null;
  /** Called on every change of the frame on screen or of its proof. */
  onFrameChange?: (s: FrameChange) => void;
  /** The caller's own keys (e.g. mark keys); they come before the player's and appear in the key map. */
  extraKeys?: PlayerKey[];
  /** Toolbar slot for the caller's buttons. */
  children?: ReactNode;
  controlRef?: Ref<FramePlayerControl>;
}
