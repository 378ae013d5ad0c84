"use client";

import { useCallback, useState, type RefObject } from "react";
import { MARK_REASONS } from "./mark-rule";
import type { FrameChange, FramePlayerControl } from "./types";

const OPENING: FrameChange = { frame: null, confirmed: false, refusal: MARK_REASONS.loading };

/**
 * The caller's side of marking: every mark button and mark key goes through `attempt`, which asks
 * the player's `markCheck` and, when it refuses, keeps the reason to show (and announce).
 */
export function useMarkGate(control: RefObject<FramePlayerControl | null>) {
  const [seen, setSeen] = useState<FrameChange>(OPENING);
  const [refused, setRefused] = useState<string | null>(null);
  const onFrameChange = useCallback((c: FrameChange) => {
    setSeen(c);
    if (c.confirmed) setRefused(null);
  }, []);
  const attempt = useCallback(
    (what: string, run: (frame: number) => void) => {
      const c = control.current?.markCheck() ?? { ok: false as const, reason: MARK_REASONS.loading };
      if (!c.ok) return setRefused(`${what} not marked. ${c.reason}`);
      setRefused(null);
      run(c.frame);
    },
    [control],
  );
  return { seen, onFrameChange, attempt, refused };
}

/** Where a refused mark says why; a live region, so a mark key pressed at the wrong moment is heard too. */
export function MarkStatus({ refused }: { refused: string | null }) {
  return (
    <p
      role="status"
      aria-live="polite"
      data-testid="mark-status"
      className={refused ? "basis-full rounded-md border-l-4 border-wick-600 bg-wick-100 px-3 py-1.5 text-sm text-ink-900" : "sr-only"}
    >
      {refused ?? ""}
    </p>
  );
}

/** Props for a mark button that stays focusable when refused, so a press can say why instead of doing nothing. */
export function markButtonProps(seen: FrameChange, busy: boolean) {
  const off = !seen.confirmed;
  return {
    "aria-disabled": off || busy,
    title: off ? (seen.refusal ?? undefined) : undefined,
    className: off ? "bg-ink-100! text-ink-600!" : "",
  };
}
