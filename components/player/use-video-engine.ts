"use client";

import { useEffect, useRef, useState } from "react";
import videojs from "video.js";
import "video.js/dist/video-js.css";

type Engine = ReturnType<typeof videojs>;

export interface VideoEngine {
  /** The element that shows the frames; null until its first frame has data. */
  video: HTMLVideoElement | null;
  engine: Engine | null;
  size: { width: number; height: number } | null;
  error: string | null;
}

/**
 * video.js as the media engine inside `host`. The element is made here, not by React: video.js
 * wraps and later removes it, which React must not see. Our own controls replace video.js' bar.
 */
export function useVideoEngine(src: string, title: string) {
  const hostRef = useRef<HTMLDivElement>(null);
  const [state, setState] = useState<VideoEngine>({ video: null, engine: null, size: null, error: null });

  useEffect(() => {
    const host = hostRef.current;
    if (!host) return;
    const video = document.createElement("video");
    // Before the source: the frame must stay readable by a canvas (the bucket is another origin).
    video.crossOrigin = "anonymous";
    video.playsInline = true;
    video.preload = "auto";
    // video.js' own styles hang on this class; it copies the tag's classes to its wrapper.
    video.className = "video-js";
    host.appendChild(video);
    const engine = videojs(video, {
      controls: false,
      preload: "auto",
      fill: true,
      children: [],
      userActions: { doubleClick: false, hotkeys: false, click: false },
    });
    // Set after video.js copied the tag's attributes to its wrapper, so they stay on the element.
    video.setAttribute("data-testid", "player-video");
    video.tabIndex = -1;
    // The player section is the landmark; a second region named "Video Player" inside it is noise.
    engine.el().removeAttribute("role");
    engine.el().removeAttribute("aria-label");
    const ready = () => setState({ video, engine, size: { width: video.videoWidth, height: video.videoHeight }, error: null });
    const failed = () => setState((s) => ({ ...s, error: "The recording could not be loaded in this browser." }));
    video.addEventListener("loadeddata", ready, { once: true });
    video.addEventListener("error", failed);
    engine.src({ src, type: "video/mp4" });
    return () => {
      video.removeEventListener("loadeddata", ready);
      video.removeEventListener("error", failed);
      engine.dispose();
      setState({ video: null, engine: null, size: null, error: null });
    };
  }, [src]);

  useEffect(() => {
    const v = state.video;
    if (!v) return;
    v.setAttribute("aria-label", title);
  }, [state.video, title]);

  return { hostRef, ...state };
}
