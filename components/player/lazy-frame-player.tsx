"use client";

import dynamic from "next/dynamic";

/** The player, loaded in the browser only: video.js needs the DOM. */
export const FramePlayer = dynamic(() => import("./frame-player"), {
  ssr: false,
  loading: () => (
    <p role="status" className="rounded-lg border border-ink-100 bg-white p-4 text-ink-600">
      Loading the player…
    </p>
  ),
});

export type { FrameChange, FramePlayerControl, FramePlayerProps, MarkCheck, PlayerMark } from "./types";
