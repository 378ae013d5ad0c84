"use client";

import { useCallback, useEffect, useRef } from "react";
import type { SeekerState } from "./frame-seeker";
import { markCheck } from "./mark-rule";
import type { FrameChange } from "./types";

/** Turns seeker states into onFrameChange calls, once per change of frame, proof or refusal. */
export function useFrameReport(onFrameChange?: (s: FrameChange) => void) {
  const listener = useRef(onFrameChange);
  const last = useRef<FrameChange | null>(null);
  useEffect(() => {
    listener.current = onFrameChange;
  }, [onFrameChange]);
  return useCallback((s: SeekerState) => {
    // The seeker reports "playing" for every play, its own or the browser's: its status says whether the picture moves.
    const check = markCheck({ status: s.status, frame: s.frame, paused: s.status !== "playing" });
    const next: FrameChange = { frame: check.ok ? check.frame : null, confirmed: check.ok, refusal: check.ok ? null : check.reason };
    const prev = last.current;
    if (prev && prev.frame === next.frame && prev.confirmed === next.confirmed && prev.refusal === next.refusal) return;
    last.current = next;
    listener.current?.(next);
  }, []);
}
