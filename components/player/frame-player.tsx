"use client";

import { useCallback, useEffect, useImperativeHandle, useRef, useState } from "react";
import { KeyMapDialog } from "./key-map-dialog";
import { MARK_REASONS, markCheck } from "./mark-rule";
import { PictureTools } from "./picture-tools";
import { PlayerControls } from "./player-controls";
import { PlayerPicture } from "./player-picture";
import { PlayerReadout } from "./player-readout";
import { PlayerScrubber } from "./player-scrubber";
import { PLAIN_VIEW, type PictureView } from "./picture-view";
import type { FramePlayerProps } from "./types";
import { usePlayerActions, type CompareMode } from "./use-player-actions";
import { useFrameReport } from "./use-frame-report";
import { useFrameSeeker } from "./use-frame-seeker";
import { usePlayerKeys } from "./use-player-keys";
import { useVideoEngine } from "./use-video-engine";

export type { FrameChange, FramePlayerControl, FramePlayerProps, MarkCheck, PlayerMark } from "./types";

const NOT_MATCHED = "The picture on screen could not be matched to a frame of the index; marks are off until it is.";

/**
 * Frame-exact player: every frame it says it shows was proven on screen by the browser's own
 * report of the painted frame's media time. `onFrameChange` (or `controlRef.confirmedFrame()`)
 * tells the caller which frame is confirmed; only a confirmed frame may be marked.
 */
export default function FramePlayer(props: FramePlayerProps) {
  const { src, poster, title, frames, offsetPts, initialFrame = 0, marks = [], filmstrip, extraKeys = [], children } = props;
  const rootRef = useRef<HTMLElement>(null);
  const surfaceRef = useRef<HTMLDivElement>(null);
  const goToRef = useRef<HTMLInputElement>(null);
  const engine = useVideoEngine(src, title);
  const report = useFrameReport(props.onFrameChange);
  const { state, times, seekerRef } = useFrameSeeker(engine.video, { pts: frames.pts, timeBase: frames.timeBase, offsetPts }, initialFrame, report);
  const [view, setView] = useState<PictureView>(PLAIN_VIEW);
  const [speed, setSpeed] = useState(1);
  const [compare, setCompare] = useState<CompareMode>("off");
  const [showReference, setShowReference] = useState(false);
  const [pinned, setPinned] = useState<number | null>(null);
  const [keyMapOpen, setKeyMapOpen] = useState(false);

  const dispense = marks.find((m) => m.kind === "dispense")?.frame ?? null;
  const reference = pinned !== null ? { frame: pinned, why: "picked by you" } : dispense !== null ? { frame: dispense, why: "the dispense mark" } : null;
  const shown = state.frame ?? state.target;

  const focusSurface = useCallback(() => surfaceRef.current?.focus(), []);
  const actions = usePlayerActions({
    seeker: seekerRef,
    times,
    setView,
    setSpeed,
    setCompare,
    setShowReference,
    pinReference: useCallback(() => setPinned(seekerRef.current?.current.frame ?? null), [seekerRef]),
    toggleKeyMap: useCallback(() => setKeyMapOpen((o) => !o), []),
    focusGoTo: useCallback(() => goToRef.current?.focus(), []),
  });
  usePlayerKeys(rootRef, actions, extraKeys);

  useEffect(() => {
    engine.engine?.playbackRate(speed);
  }, [engine.engine, speed]);

  useImperativeHandle(props.controlRef, () => {
    const check = () => {
      const s = seekerRef.current?.current;
      const video = engine.video;
      return s && video ? markCheck({ status: s.status, frame: s.frame, paused: video.paused }) : ({ ok: false, reason: MARK_REASONS.loading } as const);
    };
    return {
      confirmedFrame: () => {
        const c = check();
        return c.ok ? c.frame : null;
      },
      markCheck: check,
      goToFrame: (f: number) => seekerRef.current?.seek(f),
      focus: focusSurface,
    };
  }, [seekerRef, focusSurface, engine.video]);

  return (
    <section
      ref={rootRef}
      aria-label={`Player: ${title}`}
      data-testid="frame-player"
      data-frame={state.frame ?? ""}
      data-status={state.status}
      data-target={state.target ?? ""}
      className="space-y-3 rounded-lg border border-ink-100 bg-white p-4 shadow-sm"
    >
      {engine.error && (
        <p role="alert" className="rounded-md border-l-4 border-bad-700 bg-bad-100 px-4 py-2 text-sm text-bad-700">
          {engine.error}
        </p>
      )}
      <PlayerPicture
        hostRef={engine.hostRef}
        surfaceRef={surfaceRef}
        size={engine.size}
        poster={engine.video ? null : poster}
        view={view}
        onView={setView}
        compare={compare}
        showReference={showReference}
        reference={reference}
        current={shown}
        media={{ src, frames, offsetPts }}
        title={title}
      />
      {state.status === "unconfirmed" && (
        <div role="alert" className="flex flex-wrap items-center gap-3 rounded-md border-l-4 border-bad-700 bg-bad-100 px-4 py-2 text-sm text-bad-700">
          <span>{NOT_MATCHED}</span>
          <button
            type="button"
            className="rounded-md border border-bad-700 bg-white px-2 py-1 text-xs font-semibold"
            onClick={() => seekerRef.current?.seek(state.target ?? 0)}
          >
            Try frame {state.target} again
          </button>
        </div>
      )}
      <PlayerScrubber times={times} frame={shown} marks={marks} filmstrip={filmstrip} onSeek={(f) => seekerRef.current?.seek(f)} title={title} />
      <PlayerReadout
        status={state.status}
        frame={shown}
        frameCount={times.length}
        times={times}
        pts={frames.pts}
        timeBase={frames.timeBase}
        nominalRate={frames.variableRate ? null : frames.nominalRate}
        dispenseFrame={dispense}
      />
      <PlayerControls
        actions={actions}
        playing={state.status === "playing"}
        speed={speed}
        onSpeed={setSpeed}
        frameCount={times.length}
        goToRef={goToRef}
        onGoTo={(f) => {
          seekerRef.current?.seek(f);
          focusSurface();
        }}
        onKeyMap={() => setKeyMapOpen(true)}
      />
      {children && <div className="flex flex-wrap items-center gap-2 border-t border-ink-100 pt-3">{children}</div>}
      <details className="text-sm">
        <summary className="cursor-pointer font-semibold text-ink-800">Picture: zoom, brightness, contrast, compare</summary>
        <div className="pt-3">
          <PictureTools view={view} onView={setView} compare={compare} onCompare={setCompare} reference={reference} onPin={actions.pinReference} />
        </div>
      </details>
      <KeyMapDialog open={keyMapOpen} onClose={() => setKeyMapOpen(false)} extraKeys={extraKeys} />
    </section>
  );
}
