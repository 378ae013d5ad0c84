"use client";

import { useMemo, type Dispatch, type RefObject, type SetStateAction } from "react";
import { frameAfterSeconds } from "./frame-math";
import type { FrameSeeker } from "./frame-seeker";
import { nextSpeed, type PlayerAction } from "./key-map";
import { panBy, PLAIN_VIEW, zoomStep, type PictureView } from "./picture-view";

export type CompareMode = "off" | "side" | "swap";
const NEXT_MODE: Record<CompareMode, CompareMode> = { off: "side", side: "swap", swap: "off" };
/** One key press moves a zoomed picture by this fraction of what the pane shows. */
const PAN_STEP = 0.1;

interface Deps {
  seeker: RefObject<FrameSeeker | null>;
  times: readonly number[];
  setView: Dispatch<SetStateAction<PictureView>>;
  setSpeed: Dispatch<SetStateAction<number>>;
  setCompare: Dispatch<SetStateAction<CompareMode>>;
  setShowReference: Dispatch<SetStateAction<boolean>>;
  pinReference: () => void;
  toggleKeyMap: () => void;
  focusGoTo: () => void;
}

/** Every action of the player, for its buttons and its keys alike. */
export function usePlayerActions(d: Deps): Record<PlayerAction, () => void> {
  // biome-ignore lint/correctness/useExhaustiveDependencies: the setters passed in are React state setters, the same on every render
  return useMemo(() => {
    // From the latest frame asked for, not the last one shown: held keys add up while seeks run.
    const from = () => d.seeker.current?.current.target ?? 0;
    const go = (frame: number) => d.seeker.current?.seek(frame);
    const step = (n: number) => () => go(from() + n);
    const seconds = (s: number) => () => go(frameAfterSeconds(d.times, from(), s));
    const pan = (dx: number, dy: number) => () => d.setView((v) => panBy(v, (dx * PAN_STEP) / v.zoom, (dy * PAN_STEP) / v.zoom));
    return {
      back1: step(-1),
      forward1: step(1),
      back10: step(-10),
      forward10: step(10),
      backSecond: seconds(-1),
      forwardSecond: seconds(1),
      first: () => go(0),
      last: () => go(d.times.length - 1),
      goTo: d.focusGoTo,
      playPause: () => {
        const s = d.seeker.current;
        if (s?.current.status === "playing") s.pause();
        else s?.play();
      },
      slower: () => d.setSpeed((s) => nextSpeed(s, -1)),
      faster: () => d.setSpeed((s) => nextSpeed(s, 1)),
      zoomIn: () => d.setView((v) => zoomStep(v, 1)),
      zoomOut: () => d.setView((v) => zoomStep(v, -1)),
      panLeft: pan(-1, 0),
      panRight: pan(1, 0),
      panUp: pan(0, -1),
      panDown: pan(0, 1),
      resetPicture: () => d.setView(PLAIN_VIEW),
      compare: () => d.setCompare((m) => NEXT_MODE[m]),
      flipCompare: () => d.setShowReference((r) => !r),
      pinReference: d.pinReference,
      keyMap: d.toggleKeyMap,
    };
    // State setters never change identity; the rest is listed.
  }, [d.seeker, d.times, d.pinReference, d.toggleKeyMap, d.focusGoTo]);
}
