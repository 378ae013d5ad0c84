"use client";

import { useEffect, useRef, type RefObject } from "react";
import { actionFor, keyMatches, type PlayerAction } from "./key-map";
import type { PlayerKey } from "./types";

/** Fields whose own keys must keep working: typing, choosing, sliding. */
function usesKeysItself(el: Element): boolean {
  if (el instanceof HTMLTextAreaElement || el instanceof HTMLSelectElement) return true;
  if (el instanceof HTMLInputElement) return !["button", "checkbox", "radio", "submit", "reset"].includes(el.type);
  return el instanceof HTMLElement && el.isContentEditable;
}

/**
 * The player's keys act while focus is inside the player, or on nothing at all (the page body),
 * and never in a field that needs the key itself; Space and Enter on a button press the button.
 * The caller's keys are tried first.
 */
export function usePlayerKeys(root: RefObject<HTMLElement | null>, actions: Record<PlayerAction, () => void>, extraKeys: PlayerKey[]) {
  const latest = useRef({ actions, extraKeys });
  useEffect(() => {
    latest.current = { actions, extraKeys };
  }, [actions, extraKeys]);

  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      const host = root.current;
      if (e.defaultPrevented || e.isComposing || !host) return;
      const target = e.target instanceof Element ? e.target : null;
      const idle = !target || target === document.body || target === document.documentElement;
      if (!idle && !host.contains(target)) return;
      if (target && usesKeysItself(target)) return;
      if (target?.closest("button, a[href], summary") && (e.key === " " || e.key === "Enter")) return;
      const extra = latest.current.extraKeys.find((k) => keyMatches(k.key, e));
      if (extra) {
        e.preventDefault();
        extra.run();
        return;
      }
      const action = actionFor(e);
      // Behind the open key map only its own key (and the dialog's Escape) should do anything.
      if (!action || (target?.closest("dialog") && action !== "keyMap")) return;
      e.preventDefault();
      latest.current.actions[action]();
    };
    document.addEventListener("keydown", onKey);
    return () => document.removeEventListener("keydown", onKey);
  }, [root]);
}
