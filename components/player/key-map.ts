// The player's keys. Pure: the key handler and the key map dialog both read this list, so the
// dialog can never disagree with what the keys do.

export type PlayerAction =
  | "back1"
  | "forward1"
  | "back10"
  | "forward10"
  | "backSecond"
  | "forwardSecond"
  | "first"
  | "last"
  | "goTo"
  | "playPause"
  | "slower"
  | "faster"
  | "zoomIn"
  | "zoomOut"
  | "panLeft"
  | "panRight"
  | "panUp"
  | "panDown"
  | "resetPicture"
  | "compare"
  | "flipCompare"
  | "pinReference"
  | "keyMap";

export interface KeyBinding {
  action: PlayerAction;
  keys: string[];
  label: string;
  group: "Frames" | "Playback" | "Picture" | "Help";
}

export const PLAYER_KEYS: readonly KeyBinding[] = [
  { action: "back1", keys: ["ArrowLeft"], label: "One frame back", group: "Frames" },
  { action: "forward1", keys: ["ArrowRight"], label: "One frame forward", group: "Frames" },
  { action: "back10", keys: ["Shift+ArrowLeft"], label: "Ten frames back", group: "Frames" },
  { action: "forward10", keys: ["Shift+ArrowRight"], label: "Ten frames forward", group: "Frames" },
  { action: "backSecond", keys: ["ArrowDown"], label: "One second back (by the frames' own times)", group: "Frames" },
  { action: "forwardSecond", keys: ["ArrowUp"], label: "One second forward (by the frames' own times)", group: "Frames" },
  { action: "first", keys: ["Home"], label: "First frame", group: "Frames" },
  { action: "last", keys: ["End"], label: "Last frame", group: "Frames" },
  { action: "goTo", keys: ["g"], label: "Type a frame number to go to", group: "Frames" },
  { action: "playPause", keys: [" "], label: "Play or pause", group: "Playback" },
  { action: "slower", keys: ["["], label: "Slower", group: "Playback" },
  { action: "faster", keys: ["]"], label: "Faster", group: "Playback" },
  { action: "zoomIn", keys: ["+", "="], label: "Zoom in", group: "Picture" },
  { action: "zoomOut", keys: ["-"], label: "Zoom out", group: "Picture" },
  { action: "panLeft", keys: ["Alt+ArrowLeft"], label: "Move the zoomed picture left", group: "Picture" },
  { action: "panRight", keys: ["Alt+ArrowRight"], label: "Move the zoomed picture right", group: "Picture" },
  { action: "panUp", keys: ["Alt+ArrowUp"], label: "Move the zoomed picture up", group: "Picture" },
  { action: "panDown", keys: ["Alt+ArrowDown"], label: "Move the zoomed picture down", group: "Picture" },
  { action: "resetPicture", keys: ["0"], label: "Reset zoom, position, brightness and contrast", group: "Picture" },
  { action: "compare", keys: ["c"], label: "Compare with the reference frame: side by side, in turn, off", group: "Picture" },
  { action: "flipCompare", keys: ["x"], label: "Compare in turn: show the other frame", group: "Picture" },
  { action: "pinReference", keys: ["r"], label: "Make the frame on screen the reference frame", group: "Picture" },
  { action: "keyMap", keys: ["?"], label: "Show or hide this key map", group: "Help" },
];

interface KeyPress {
  key: string;
  shiftKey: boolean;
  altKey: boolean;
  ctrlKey: boolean;
  metaKey: boolean;
}

interface Spec {
  key: string;
  shift: boolean;
  alt: boolean;
  ctrl: boolean;
}

function parseSpec(spec: string): Spec {
  // "+" alone is a key, and so is the last "+" of "Shift++".
  const plusKey = spec.endsWith("+") && (spec.length === 1 || spec.at(-2) === "+");
  const cut = plusKey ? spec.length - 1 : spec.lastIndexOf("+") + 1;
  const key = spec.slice(cut);
  const mods = new Set(
    spec
      .slice(0, cut)
      .split("+")
      .filter(Boolean)
      .map((p) => p.toLowerCase()),
  );
  return { key, shift: mods.has("shift"), alt: mods.has("alt"), ctrl: mods.has("ctrl") || mods.has("control") };
}

const isLetter = (k: string) => k.length === 1 && k.toLowerCase() !== k.toUpperCase();

/**
 * Whether a key press is the one a spec names. Letters match either case and count Shift; other
 * single characters ("?", "[", "+") already say whether Shift was held, so Shift is not counted.
 * Ctrl and the command key never match a spec without them, so the browser's own shortcuts stay.
 */
export function keyMatches(spec: string, e: KeyPress): boolean {
  const s = parseSpec(spec);
  if (e.altKey !== s.alt || e.ctrlKey !== s.ctrl || e.metaKey) return false;
  if (isLetter(s.key)) return e.key.toLowerCase() === s.key.toLowerCase() && e.shiftKey === s.shift;
  if (s.key.length === 1) return e.key === s.key;
  return e.key === s.key && e.shiftKey === s.shift;
}

export function actionFor(e: KeyPress): PlayerAction | null {
  return PLAYER_KEYS.find((b) => b.keys.some((k) => keyMatches(k, e)))?.action ?? null;
}

const NAMES: Record<string, string> = { ArrowLeft: "←", ArrowRight: "→", ArrowUp: "↑", ArrowDown: "↓", " ": "Space" };

/** How a key spec is written for people: "Shift + ←", "Space", "G". */
export function keyLabel(spec: string): string {
  const s = parseSpec(spec);
  const key = NAMES[s.key] ?? (isLetter(s.key) ? s.key.toUpperCase() : s.key);
  return [s.ctrl && "Ctrl", s.alt && "Alt", s.shift && "Shift", key].filter(Boolean).join(" + ");
}

export const SPEEDS = [0.1, 0.25, 0.5, 1, 2, 4] as const;

/** The next speed in the list, stopping at either end. */
export function nextSpeed(current: number, direction: 1 | -1): number {
  const i = SPEEDS.findIndex((s) => s >= current - 1e-9);
  const at = i < 0 ? SPEEDS.length - 1 : i;
  return SPEEDS[Math.max(0, Math.min(SPEEDS.length - 1, at + direction))];
}
