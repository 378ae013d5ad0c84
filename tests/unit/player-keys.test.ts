import { describe, expect, it } from "vitest";
import { actionFor, keyLabel, keyMatches, nextSpeed, PLAYER_KEYS, SPEEDS } from "@/components/player/key-map";
import { dragBy, panBy, pictureStyle, PLAIN_VIEW, withTone, withZoom, zoomStep } from "@/components/player/picture-view";

const press = (key: string, mods: Partial<{ shiftKey: boolean; altKey: boolean; ctrlKey: boolean; metaKey: boolean }> = {}) => ({
  key,
  shiftKey: false,
  altKey: false,
  ctrlKey: false,
  metaKey: false,
  ...mods,
});

describe("player keys", () => {
  it("steps by one and ten frames and by a second", () => {
    expect(actionFor(press("ArrowRight"))).toBe("forward1");
    expect(actionFor(press("ArrowLeft", { shiftKey: true }))).toBe("back10");
    expect(actionFor(press("ArrowUp"))).toBe("forwardSecond");
    expect(actionFor(press("ArrowLeft", { altKey: true }))).toBe("panLeft");
  });

  it("leaves the browser's Ctrl and command shortcuts alone", () => {
    expect(actionFor(press("c", { ctrlKey: true }))).toBeNull();
    expect(actionFor(press("ArrowLeft", { metaKey: true }))).toBeNull();
  });

  it("matches letters in either case but counts Shift, and takes shifted characters as typed", () => {
    expect(keyMatches("g", press("G", { shiftKey: true }))).toBe(false);
    expect(keyMatches("Shift+D", press("D", { shiftKey: true }))).toBe(true);
    expect(keyMatches("d", press("D"))).toBe(true);
    expect(actionFor(press("?", { shiftKey: true }))).toBe("keyMap");
    expect(actionFor(press("+", { shiftKey: true }))).toBe("zoomIn");
  });

  it("gives every key to one action only", () => {
    const all = PLAYER_KEYS.flatMap((b) => b.keys);
    expect(new Set(all).size).toBe(all.length);
    for (const b of PLAYER_KEYS)
      for (const k of b.keys)
        expect(actionFor(press(k.replace(/^(Shift|Alt)\+/, ""), { shiftKey: k.startsWith("Shift+"), altKey: k.startsWith("Alt+") }))).toBe(b.action);
  });

  it("writes keys for people", () => {
    expect(keyLabel("Shift+ArrowLeft")).toBe("Shift + ←");
    expect(keyLabel(" ")).toBe("Space");
    expect(keyLabel("g")).toBe("G");
    expect(keyLabel("+")).toBe("+");
  });

  it("moves through the speeds from 0.1× to 4× and stops at the ends", () => {
    expect(SPEEDS[0]).toBe(0.1);
    expect(SPEEDS[SPEEDS.length - 1]).toBe(4);
    expect(nextSpeed(1, 1)).toBe(2);
    expect(nextSpeed(1, -1)).toBe(0.5);
    expect(nextSpeed(4, 1)).toBe(4);
    expect(nextSpeed(0.1, -1)).toBe(0.1);
  });
});

describe("picture zoom, position and tone", () => {
  it("zooms from 1× to 8× and no further, doubling every two steps", () => {
    let v = PLAIN_VIEW;
    for (let i = 0; i < 4; i++) v = zoomStep(v, 1);
    expect(v.zoom).toBe(4);
    expect(zoomStep(zoomStep(v, -1), -1).zoom).toBe(2);
    for (let i = 0; i < 10; i++) v = zoomStep(v, 1);
    expect(v.zoom).toBe(8);
    expect(withZoom(PLAIN_VIEW, 0.5).zoom).toBe(1);
  });

  it("keeps the frame's edge out of the pane when moving or zooming out", () => {
    const z2 = withZoom(PLAIN_VIEW, 2);
    expect(panBy(z2, 1, -1)).toMatchObject({ centerX: 0.25, centerY: -0.25 });
    expect(panBy(PLAIN_VIEW, 0.3, 0)).toMatchObject({ centerX: 0 });
    expect(withZoom(panBy(withZoom(PLAIN_VIEW, 4), 1, 0), 2).centerX).toBe(0.25);
  });

  it("makes the picture follow a drag", () => {
    // At 2× a 100 px drag to the right in a 400 px pane shows 1/8 of the frame more of the left.
    expect(dragBy(withZoom(PLAIN_VIEW, 2), 100, 0, 400, 300).centerX).toBeCloseTo(-0.125, 12);
  });

  it("draws tone with a CSS filter and position with a transform", () => {
    expect(pictureStyle(PLAIN_VIEW)).toEqual({ transform: "scale(1) translate(0%, 0%)", filter: "none" });
    const v = withTone(panBy(withZoom(PLAIN_VIEW, 2), 0.1, 0), { brightness: 1.5, contrast: 9 });
    expect(pictureStyle(v)).toEqual({ transform: "scale(2) translate(-10%, 0%)", filter: "brightness(1.5) contrast(4)" });
  });
});
