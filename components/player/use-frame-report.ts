"use client";

import { useCallback, useEffect, useRef } from "react";
import type { SeekerState } from "./frame-seeker";
import type { FrameChange } from "./types";

/** Turns seeker states into onFrameChange calls, once per change of frame or proof. */
export function useFrameReport(onFrameChange?: (s: FrameChange) => void) {
  const listener = useRef(onFrameChange);
  const last = useRef<FrameChange | null>(null);
  useEffect(() => {
    listener.current = onFrameChange;
  }, [onFrameChange]);
  return useCallback((s: SeekerState) => {
    const confirmed = (s.status === "confirmed" || s.status === "playing") && s.frame !== null;
    const next = { frame: confirmed ? s.frame : null, confirmed };
    if (last.current && last.current.frame === next.frame && last.current.confirmed === next.confirmed) return;
    last.current = next;
    listener.current?.(next);
  }, []);
}
