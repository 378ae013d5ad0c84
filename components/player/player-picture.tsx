"use client";

import { useRef, type ReactNode, type RefObject } from "react";
import { CompareVideo } from "./compare-video";
import { dragBy, pictureStyle, type PictureView } from "./picture-view";
import type { CompareMode } from "./use-player-actions";
import type { PlayerFrames } from "./types";

interface Props {
  hostRef: RefObject<HTMLDivElement | null>;
  surfaceRef: RefObject<HTMLDivElement | null>;
  size: { width: number; height: number } | null;
  /** Shown until the first frame has loaded (as a plain image: the bucket answers it without CORS). */
  poster?: string | null;
  view: PictureView;
  onView: (update: (v: PictureView) => PictureView) => void;
  compare: CompareMode;
  showReference: boolean;
  reference: { frame: number; why: string } | null;
  current: number | null;
  media: { src: string; frames: PlayerFrames; offsetPts: number };
  title: string;
}

function Pane({
  ratio,
  caption,
  children,
  view,
  onView,
}: {
  ratio: number;
  caption?: string;
  children: ReactNode;
  view: PictureView;
  onView: Props["onView"];
}) {
  const drag = useRef<{ x: number; y: number } | null>(null);
  return (
    <figure className="mx-auto space-y-1" style={{ width: `min(100%, calc(56vh * ${ratio}))` }}>
      <div
        className={`relative w-full overflow-hidden rounded-md bg-ink-900 ${view.zoom > 1 ? "cursor-grab active:cursor-grabbing" : ""}`}
        style={{ aspectRatio: ratio }}
        onPointerDown={(e) => {
          if (view.zoom <= 1) return;
          e.currentTarget.setPointerCapture(e.pointerId);
          drag.current = { x: e.clientX, y: e.clientY };
        }}
        onPointerMove={(e) => {
          const from = drag.current;
          if (!from) return;
          const { width, height } = e.currentTarget.getBoundingClientRect();
          drag.current = { x: e.clientX, y: e.clientY };
          onView((v) => dragBy(v, e.clientX - from.x, e.clientY - from.y, width, height));
        }}
        onPointerUp={() => (drag.current = null)}
        onPointerCancel={() => (drag.current = null)}
      >
        <div className="absolute inset-0 origin-center" style={pictureStyle(view)}>
          {children}
        </div>
      </div>
      {caption && <figcaption className="text-center text-sm text-ink-600">{caption}</figcaption>}
    </figure>
  );
}

/** The picture (zoomed, moved, toned), and beside it or in turn the reference frame. */
export function PlayerPicture(p: Props) {
  const ratio = p.size && p.size.height > 0 ? p.size.width / p.size.height : 16 / 9;
  const reference = p.compare !== "off" ? p.reference : null;
  const refVideo = reference && (
    <CompareVideo
      src={p.media.src}
      frames={p.media.frames}
      offsetPts={p.media.offsetPts}
      frame={reference.frame}
      label={`Reference frame ${reference.frame} of ${p.title}`}
    />
  );
  const onView = p.onView;
  const side = p.compare === "side" && reference !== null;
  const main = (
    <Pane
      key="now"
      ratio={ratio}
      view={p.view}
      onView={onView}
      caption={
        reference
          ? p.compare === "side" || !p.showReference
            ? `Now: frame ${p.current ?? "—"}`
            : `Reference: frame ${reference.frame} (${reference.why})`
          : undefined
      }
    >
      {p.poster && <img src={p.poster} alt="" className="absolute inset-0 h-full w-full object-contain" />}
      <div ref={p.hostRef} className="absolute inset-0 [&_.video-js]:absolute [&_.video-js]:inset-0 [&_.video-js]:bg-transparent [&_video]:object-contain" />
      {p.compare === "swap" && reference && <div className={p.showReference ? "absolute inset-0" : "hidden"}>{refVideo}</div>}
    </Pane>
  );
  return (
    // biome-ignore lint/a11y/useSemanticElements: the picture takes focus to receive the stepping keys; a fieldset would be wrong
    <div
      ref={p.surfaceRef}
      // biome-ignore lint/a11y/noNoninteractiveTabindex: the picture is the keyboard target of the player
      tabIndex={0}
      role="group"
      aria-label={`Picture of ${p.title}. Arrow keys step through the frames; press ? for every key.`}
      className="rounded-md"
    >
      {/* One parent in every mode: the main pane holds video.js' element and must never remount. */}
      <div className={side ? "grid grid-cols-2 gap-3" : ""}>
        {side && (
          <Pane key="reference" ratio={ratio} view={p.view} onView={onView} caption={`Reference: frame ${reference.frame} (${reference.why})`}>
            {refVideo}
          </Pane>
        )}
        {main}
      </div>
    </div>
  );
}
