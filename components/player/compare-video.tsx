"use client";

import { useEffect, useState } from "react";
import { useFrameSeeker } from "./use-frame-seeker";
import type { PlayerFrames } from "./types";

interface Props {
  src: string;
  frames: PlayerFrames;
  offsetPts: number;
  frame: number;
  label: string;
}

/**
 * The reference frame in a second, muted element, proven the same way as the main picture, so
 * a comparison never sets a guessed frame beside the real one.
 */
export function CompareVideo({ src, frames, offsetPts, frame, label }: Props) {
  const [el, setEl] = useState<HTMLVideoElement | null>(null);
  const [loaded, setLoaded] = useState<HTMLVideoElement | null>(null);
  const { state, seekerRef } = useFrameSeeker(loaded, { pts: frames.pts, timeBase: frames.timeBase, offsetPts }, frame);
  useEffect(() => {
    seekerRef.current?.seek(frame);
  }, [frame, seekerRef]);
  useEffect(() => {
    if (!el) return;
    const ready = () => setLoaded(el);
    if (el.readyState >= 2) ready();
    el.addEventListener("loadeddata", ready);
    return () => el.removeEventListener("loadeddata", ready);
  }, [el]);
  const proven = state.status === "confirmed" && state.frame === frame;
  return (
    <>
      <video
        ref={setEl}
        src={src}
        crossOrigin="anonymous"
        muted
        playsInline
        preload="auto"
        tabIndex={-1}
        aria-label={label}
        data-testid="compare-video"
        className="absolute inset-0 h-full w-full object-contain"
      />
      {!proven && (
        <p className="absolute inset-x-0 bottom-0 bg-ink-900/80 px-2 py-1 text-xs text-white">
          {state.status === "unconfirmed" ? "The reference picture could not be matched to its frame." : "Finding the reference frame…"}
        </p>
      )}
    </>
  );
}
