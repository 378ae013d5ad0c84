"use client";

import { useState, type ReactNode, type RefObject } from "react";
import { SPEEDS, type PlayerAction } from "./key-map";

const BTN = "rounded-md border border-ink-200 bg-white px-2.5 py-1.5 text-sm font-semibold text-ink-800 hover:bg-ink-50 disabled:text-ink-400";

function StepButton({ label, text, onClick }: { label: string; text: ReactNode; onClick: () => void }) {
  return (
    <button type="button" className={BTN} aria-label={label} title={label} onClick={onClick}>
      {text}
    </button>
  );
}

interface Props {
  actions: Record<PlayerAction, () => void>;
  playing: boolean;
  speed: number;
  onSpeed: (s: number) => void;
  frameCount: number;
  goToRef: RefObject<HTMLInputElement | null>;
  onGoTo: (frame: number) => void;
  onKeyMap: () => void;
}

/** Stepping, playing, speed and go-to-frame. Every button has a key too (see the key map). */
export function PlayerControls({ actions: a, playing, speed, onSpeed, frameCount, goToRef, onGoTo, onKeyMap }: Props) {
  const [typed, setTyped] = useState("");
  const [problem, setProblem] = useState<string | null>(null);
  const submit = () => {
    const n = Number(typed.trim());
    if (!/^\d+$/.test(typed.trim()) || n >= frameCount) {
      setProblem(`Type a frame number from 0 to ${frameCount - 1}.`);
      return;
    }
    setProblem(null);
    onGoTo(n);
  };
  return (
    <div className="flex flex-wrap items-center gap-x-4 gap-y-2">
      {/* biome-ignore lint/a11y/useSemanticElements: a labelled row of buttons, not form fields */}
      <div role="group" aria-label="Step" className="flex flex-wrap items-center gap-1">
        <StepButton label="One second back" text="−1 s" onClick={a.backSecond} />
        <StepButton label="Ten frames back" text="−10" onClick={a.back10} />
        <StepButton label="One frame back" text="−1" onClick={a.back1} />
        <button type="button" className={`${BTN} min-w-[4.5rem] bg-wick-500 text-ink-900 hover:bg-wick-300`} onClick={a.playPause}>
          {playing ? "Pause" : "Play"}
        </button>
        <StepButton label="One frame forward" text="+1" onClick={a.forward1} />
        <StepButton label="Ten frames forward" text="+10" onClick={a.forward10} />
        <StepButton label="One second forward" text="+1 s" onClick={a.forwardSecond} />
      </div>
      <label className="flex items-center gap-2 text-sm text-ink-800">
        Speed
        <select className="rounded-md border border-ink-200 bg-white px-2 py-1.5 text-sm" value={speed} onChange={(e) => onSpeed(Number(e.target.value))}>
          {SPEEDS.map((s) => (
            <option key={s} value={s}>
              {s}×
            </option>
          ))}
        </select>
      </label>
      <form
        className="flex items-center gap-2"
        onSubmit={(e) => {
          e.preventDefault();
          submit();
        }}
      >
        <label htmlFor="player-go-to" className="text-sm text-ink-800">
          Go to frame
        </label>
        <input
          id="player-go-to"
          ref={goToRef}
          inputMode="numeric"
          autoComplete="off"
          value={typed}
          onChange={(e) => setTyped(e.target.value)}
          aria-invalid={problem ? true : undefined}
          aria-describedby={problem ? "player-go-to-problem" : undefined}
          className="w-24 rounded-md border border-ink-200 px-2 py-1.5 font-mono text-sm"
        />
        <button type="submit" className={BTN}>
          Go
        </button>
        {problem && (
          <span id="player-go-to-problem" role="alert" className="text-sm text-bad-700">
            {problem}
          </span>
        )}
      </form>
      <button type="button" className={BTN} onClick={onKeyMap} aria-haspopup="dialog">
        Keys <kbd className="ml-1 rounded border border-ink-200 px-1 font-mono text-xs">?</kbd>
      </button>
    </div>
  );
}
