"use client";

import { useEffect, useRef, useState } from "react";
import { clipTime, formatSeconds, timecodeOf, type TimeBase } from "./frame-math";
import type { PlayerStatus } from "./frame-seeker";

const STATUS_WORDS: Record<PlayerStatus, string> = {
  loading: "Loading…",
  seeking: "Finding the frame…",
  confirmed: "Frame confirmed",
  unconfirmed: "Not matched",
  playing: "Playing",
};
const STATUS_TONE: Record<PlayerStatus, string> = {
  loading: "bg-ink-100 text-ink-800",
  seeking: "bg-ink-100 text-ink-800",
  confirmed: "bg-ok-100 text-ok-700",
  unconfirmed: "bg-bad-100 text-bad-700",
  playing: "bg-wick-100 text-ink-900",
};
/** Screen readers hear the frame at most this often while keys are held. */
const ANNOUNCE_EVERY_MS = 700;

interface Props {
  status: PlayerStatus;
  frame: number | null;
  frameCount: number;
  times: readonly number[];
  pts: readonly number[];
  timeBase: TimeBase;
  nominalRate: string | null;
  dispenseFrame: number | null;
}

function Figure({ label, value, wide }: { label: string; value: string; wide?: boolean }) {
  return (
    <div className={wide ? "min-w-[9rem]" : "min-w-[7rem]"}>
      <dt className="text-xs font-semibold uppercase tracking-wide text-ink-600">{label}</dt>
      <dd className="font-mono text-lg tabular-nums text-ink-900">{value}</dd>
    </div>
  );
}

/** Frame number, time since the dispense mark, clip time and timecode, and a polite spoken frame number. */
export function PlayerReadout(p: Props) {
  const f = p.frame;
  const since = f !== null && p.dispenseFrame !== null ? formatSeconds(p.times[f] - p.times[p.dispenseFrame], true) : null;
  const tc = f !== null ? timecodeOf(f, p.nominalRate) : null;
  return (
    <div className="flex flex-wrap items-end gap-x-6 gap-y-2">
      <dl className="flex flex-wrap gap-x-6 gap-y-2">
        <Figure label="Frame" value={f === null ? "—" : String(f)} />
        {p.dispenseFrame !== null && <Figure label="Since dispense" value={since ?? "—"} wide />}
        <Figure label="Clip time" value={f === null ? "—" : formatSeconds(clipTime(p.pts, p.timeBase, f))} wide />
        {p.nominalRate && <Figure label="Timecode" value={tc ?? "—"} wide />}
      </dl>
      <p className="pb-1 text-sm text-ink-600">
        <span className={`mr-2 rounded px-2 py-0.5 text-xs font-semibold ${STATUS_TONE[p.status]}`}>{STATUS_WORDS[p.status]}</span>
        {p.frameCount} frames, numbered from 0
      </p>
      <Announcer status={p.status} frame={f} />
    </div>
  );
}

/** Says the frame number once things settle, throttled so held keys do not flood the reader. */
function Announcer({ status, frame }: { status: PlayerStatus; frame: number | null }) {
  const [text, setText] = useState("");
  const last = useRef(0);
  const next = status === "confirmed" && frame !== null ? `Frame ${frame}` : status === "unconfirmed" ? "Frame not matched" : null;
  useEffect(() => {
    if (next === null) return;
    const wait = Math.max(0, last.current + ANNOUNCE_EVERY_MS - Date.now());
    const timer = setTimeout(() => {
      last.current = Date.now();
      setText(next);
    }, wait);
    return () => clearTimeout(timer);
  }, [next]);
  return (
    <p className="sr-only" aria-live="polite" aria-atomic="true">
      {text}
    </p>
  );
}
