"use client";

import { useEffect, useMemo, useRef, useState } from "react";
import { mediaTimes, type TimeBase } from "./frame-math";
import { FrameSeeker, type SeekerState } from "./frame-seeker";

const LOADING: SeekerState = { status: "loading", frame: null, target: null };

/**
 * One FrameSeeker per video element and index. Opens on `initialFrame`; `onState` hears every
 * change (the player turns it into onFrameChange).
 */
export function useFrameSeeker(
  video: HTMLVideoElement | null,
  index: { pts: number[]; timeBase: TimeBase; offsetPts: number },
  initialFrame: number,
  onState?: (s: SeekerState) => void,
) {
  const { pts, timeBase, offsetPts } = index;
  const times = useMemo(() => mediaTimes(pts, timeBase, offsetPts), [pts, timeBase, offsetPts]);
  const [state, setState] = useState<SeekerState>(LOADING);
  const seekerRef = useRef<FrameSeeker | null>(null);
  const listener = useRef(onState);
  useEffect(() => {
    listener.current = onState;
  }, [onState]);
  // Where to open, until the seeker exists; after that a move is the caller's seek, not a new seeker.
  const opening = useRef(initialFrame);
  useEffect(() => {
    if (!seekerRef.current) opening.current = initialFrame;
  }, [initialFrame]);

  useEffect(() => {
    if (!video || times.length === 0) return;
    const seeker = new FrameSeeker(video, times, (s) => {
      setState(s);
      listener.current?.(s);
    });
    seekerRef.current = seeker;
    seeker.seek(opening.current);
    return () => {
      seeker.dispose();
      seekerRef.current = null;
      setState(LOADING);
    };
  }, [video, times]);

  return { state, times, seekerRef };
}
