"use client";

import { useRef, type PointerEvent } from "react";
import { frameContaining } from "./frame-math";
import type { PlayerMark } from "./types";

const MARK_TONE: Record<PlayerMark["kind"], string> = {
  dispense: "bg-wick-600 text-white",
  clear: "bg-ok-700 text-white",
  other: "bg-ink-600 text-white",
};

interface Props {
  times: readonly number[];
  frame: number | null;
  marks: PlayerMark[];
  filmstrip?: { url: string; tiles: number } | null;
  onSeek: (frame: number) => void;
  title: string;
}

/** Labels closer than this (percent of the strip) go on a second row, so a drop's two marks stay readable. */
const LABEL_GAP = 10;

function placeLabels<T extends { left: number }>(items: T[]): (T & { row: 0 | 1 })[] {
  const lastLeft = [-Infinity, -Infinity];
  return [...items]
    .sort((a, b) => a.left - b.left)
    .map((it) => {
      const row: 0 | 1 = it.left - lastLeft[0] >= LABEL_GAP || it.left - lastLeft[1] < LABEL_GAP ? 0 : 1;
      lastLeft[row] = it.left;
      return { ...it, row };
    });
}

/**
 * The whole clip as a strip; position follows each frame's own time, so a variable-rate clip is
 * drawn as it plays. Dragging asks for frames as the pointer moves; the player keeps only the latest.
 */
export function PlayerScrubber({ times, frame, marks, filmstrip, onSeek, title }: Props) {
  const trackRef = useRef<HTMLDivElement>(null);
  const last = times.length - 1;
  const span = last > 0 ? times[last] - times[0] : 1;
  const at = (f: number) => (last > 0 ? ((times[f] - times[0]) / span) * 100 : 0);

  const labels = placeLabels(marks.map((m) => ({ mark: m, left: at(Math.max(0, Math.min(last, m.frame))) })));

  const seekToPointer = (e: PointerEvent<HTMLDivElement>) => {
    const box = trackRef.current?.getBoundingClientRect();
    if (!box || box.width === 0) return;
    const x = Math.max(0, Math.min(1, (e.clientX - box.left) / box.width));
    onSeek(frameContaining(times, times[0] + x * span));
  };

  return (
    <div className="space-y-1">
      {filmstrip && (
        <div
          aria-hidden="true"
          className="h-10 w-full rounded-sm border border-ink-200 bg-ink-900 bg-no-repeat"
          style={{ backgroundImage: `url("${filmstrip.url}")`, backgroundSize: "100% 100%" }}
        />
      )}
      {marks.length > 0 && (
        <div className={`relative ${labels.some((l) => l.row === 1) ? "h-11" : "h-6"}`}>
          {labels.map(({ mark: m, left, row }) => (
            <span
              key={`${m.kind}-${m.frame}-${m.label}`}
              title={`${m.label}: frame ${m.frame}`}
              className={`absolute whitespace-nowrap rounded-sm px-1 text-[0.7rem] font-semibold leading-5 ${MARK_TONE[m.kind]} ${left < 6 ? "" : left > 94 ? "-translate-x-full" : "-translate-x-1/2"}`}
              style={{ left: `${left}%`, top: row ? "1.25rem" : 0 }}
            >
              {m.label}
            </span>
          ))}
        </div>
      )}
      <div
        ref={trackRef}
        role="slider"
        tabIndex={0}
        aria-label={`Position in ${title}`}
        aria-valuemin={0}
        aria-valuemax={last}
        aria-valuenow={frame ?? 0}
        aria-valuetext={frame === null ? "Frame not known yet" : `Frame ${frame} of ${last + 1}`}
        className="relative h-8 cursor-pointer touch-none rounded-md bg-ink-100"
        onPointerDown={(e) => {
          e.currentTarget.setPointerCapture(e.pointerId);
          seekToPointer(e);
        }}
        onPointerMove={(e) => {
          if (e.currentTarget.hasPointerCapture(e.pointerId)) seekToPointer(e);
        }}
      >
        {marks.map((m) => (
          <span
            key={`line-${m.kind}-${m.frame}-${m.label}`}
            aria-hidden="true"
            className={`absolute inset-y-0 w-0.5 ${MARK_TONE[m.kind]}`}
            style={{ left: `${at(Math.max(0, Math.min(last, m.frame)))}%` }}
          />
        ))}
        {frame !== null && (
          <span
            aria-hidden="true"
            className="absolute inset-y-0 -ml-1.5 w-3 rounded-sm border-2 border-ink-900 bg-white shadow"
            style={{ left: `${at(frame)}%` }}
          />
        )}
      </div>
      <p className="sr-only">Marks: {marks.length ? marks.map((m) => `${m.label} at frame ${m.frame}`).join("; ") : "none"}.</p>
    </div>
  );
}
