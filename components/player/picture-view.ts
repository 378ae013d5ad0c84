// Zoom, position and tone of the picture. Pure: the player keeps one of these in state and both
// panes (current and reference frame) are drawn with it, so a comparison lines up.

export interface PictureView {
  zoom: number;
  /** The point of the frame at the middle of the pane, as a fraction of the frame from its centre. */
  centerX: number;
  centerY: number;
  brightness: number;
  contrast: number;
}

export const ZOOM = { min: 1, max: 8 } as const;
export const BRIGHTNESS = { min: 0.5, max: 3 } as const;
export const CONTRAST = { min: 0.5, max: 4 } as const;
export const PLAIN_VIEW: PictureView = { zoom: 1, centerX: 0, centerY: 0, brightness: 1, contrast: 1 };

const clamp = (v: number, lo: number, hi: number) => Math.max(lo, Math.min(hi, v));
/** How far the centre may move before the frame's edge would enter the pane. */
const reach = (zoom: number) => (1 - 1 / zoom) / 2;

export function withZoom(v: PictureView, zoom: number): PictureView {
  const z = clamp(zoom, ZOOM.min, ZOOM.max);
  return { ...v, zoom: z, centerX: clamp(v.centerX, -reach(z), reach(z)), centerY: clamp(v.centerY, -reach(z), reach(z)) };
}

/** Zoom moves along the powers of √2 (1, 1.41, 2, 2.83, 4…), so two presses double it from wherever the slider left it. */
export function zoomStep(v: PictureView, direction: 1 | -1): PictureView {
  const rung = Math.round(Math.log(v.zoom) / Math.log(Math.SQRT2));
  return withZoom(v, Math.round(Math.SQRT2 ** (rung + direction) * 100) / 100);
}

/** Move the centre by a fraction of the frame (positive: show more of the right / bottom). */
export function panBy(v: PictureView, dx: number, dy: number): PictureView {
  const r = reach(v.zoom);
  return { ...v, centerX: clamp(v.centerX + dx, -r, r), centerY: clamp(v.centerY + dy, -r, r) };
}

/** A drag of the picture by (dx, dy) screen pixels in a pane of the given size: the picture follows the pointer. */
export const dragBy = (v: PictureView, dx: number, dy: number, paneWidth: number, paneHeight: number) =>
  panBy(v, -dx / (v.zoom * paneWidth), -dy / (v.zoom * paneHeight));

export const withTone = (v: PictureView, tone: Partial<Pick<PictureView, "brightness" | "contrast">>): PictureView => ({
  ...v,
  brightness: clamp(tone.brightness ?? v.brightness, BRIGHTNESS.min, BRIGHTNESS.max),
  contrast: clamp(tone.contrast ?? v.contrast, CONTRAST.min, CONTRAST.max),
});

/** CSS for the zoomed, moved, toned picture; the transform origin is the pane's centre. */
export function pictureStyle(v: PictureView): { transform: string; filter: string } {
  return {
    transform: `scale(${v.zoom}) translate(${-v.centerX * 100}%, ${-v.centerY * 100}%)`,
    filter: v.brightness === 1 && v.contrast === 1 ? "none" : `brightness(${v.brightness}) contrast(${v.contrast})`,
  };
}
