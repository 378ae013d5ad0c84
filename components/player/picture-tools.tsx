"use client";

import type { CompareMode } from "./use-player-actions";
import { BRIGHTNESS, CONTRAST, withTone, withZoom, ZOOM, PLAIN_VIEW, type PictureView } from "./picture-view";

interface Props {
  view: PictureView;
  onView: (v: PictureView) => void;
  compare: CompareMode;
  onCompare: (m: CompareMode) => void;
  reference: { frame: number; why: string } | null;
  onPin: () => void;
}

function Slider({
  label,
  value,
  min,
  max,
  step,
  unit,
  onChange,
}: {
  label: string;
  value: number;
  min: number;
  max: number;
  step: number;
  unit: string;
  onChange: (v: number) => void;
}) {
  return (
    <label className="flex items-center gap-2 text-sm text-ink-800">
      <span className="w-20">{label}</span>
      <input
        type="range"
        min={min}
        max={max}
        step={step}
        value={value}
        onChange={(e) => onChange(Number(e.target.value))}
        className="w-28 accent-wick-600"
        aria-valuetext={`${value.toFixed(2)}${unit}`}
      />
      <span className="w-12 font-mono text-xs tabular-nums">
        {value.toFixed(2)}
        {unit}
      </span>
    </label>
  );
}

const BTN = "rounded-md border border-ink-200 bg-white px-2.5 py-1.5 text-sm font-semibold text-ink-800 hover:bg-ink-50";

/** Zoom, tone and the comparison with a reference frame. */
export function PictureTools({ view, onView, compare, onCompare, reference, onPin }: Props) {
  return (
    <div className="flex flex-wrap items-center gap-x-6 gap-y-2">
      <div className="space-y-1">
        <Slider label="Zoom" value={view.zoom} min={ZOOM.min} max={ZOOM.max} step={0.25} unit="×" onChange={(z) => onView(withZoom(view, z))} />
        <Slider
          label="Brightness"
          value={view.brightness}
          min={BRIGHTNESS.min}
          max={BRIGHTNESS.max}
          step={0.05}
          unit=""
          onChange={(b) => onView(withTone(view, { brightness: b }))}
        />
        <Slider
          label="Contrast"
          value={view.contrast}
          min={CONTRAST.min}
          max={CONTRAST.max}
          step={0.05}
          unit=""
          onChange={(c) => onView(withTone(view, { contrast: c }))}
        />
      </div>
      <div className="space-y-2">
        <div className="flex flex-wrap items-center gap-2">
          <label className="flex items-center gap-2 text-sm text-ink-800">
            Compare
            <select
              className="rounded-md border border-ink-200 bg-white px-2 py-1.5 text-sm"
              value={compare}
              disabled={!reference}
              onChange={(e) => onCompare(e.target.value as CompareMode)}
            >
              <option value="off">off</option>
              <option value="side">side by side</option>
              <option value="swap">in turn</option>
            </select>
          </label>
          <button type="button" className={BTN} onClick={onPin}>
            Use this frame as reference
          </button>
          <button type="button" className={BTN} onClick={() => onView(PLAIN_VIEW)}>
            Reset picture
          </button>
        </div>
        <p className="text-sm text-ink-600">
          {reference
            ? `Reference: frame ${reference.frame} (${reference.why}).`
            : "No reference frame: there is no dispense mark yet. Pick one with “Use this frame as reference”."}
        </p>
      </div>
    </div>
  );
}
