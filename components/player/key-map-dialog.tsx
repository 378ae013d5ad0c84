"use client";

import { useEffect, useRef } from "react";
import { keyLabel, PLAYER_KEYS, type KeyBinding } from "./key-map";
import type { PlayerKey } from "./types";

function Rows({ rows }: { rows: { keys: string[]; label: string }[] }) {
  return (
    <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
      {rows.map((r) => (
        <div key={r.label} className="contents">
          <dt className="whitespace-nowrap">
            {r.keys.map((k, i) => (
              <span key={k}>
                {i > 0 && <span className="px-1 text-ink-600">or</span>}
                <kbd className="rounded border border-ink-200 bg-ink-50 px-1.5 py-0.5 font-mono text-xs">{keyLabel(k)}</kbd>
              </span>
            ))}
          </dt>
          <dd className="text-ink-800">{r.label}</dd>
        </div>
      ))}
    </dl>
  );
}

const GROUPS: KeyBinding["group"][] = ["Frames", "Picture", "Playback", "Help"];

/** Every key the player answers to, the caller's included: the same list the key handler reads. */
export function KeyMapDialog({ open, onClose, extraKeys }: { open: boolean; onClose: () => void; extraKeys: PlayerKey[] }) {
  const ref = useRef<HTMLDialogElement>(null);
  useEffect(() => {
    const d = ref.current;
    if (!d) return;
    if (open && !d.open) d.showModal();
    if (!open && d.open) d.close();
  }, [open]);
  return (
    <dialog
      ref={ref}
      onClose={onClose}
      aria-labelledby="player-keys-title"
      className="m-auto max-h-[85vh] w-[min(64rem,94vw)] overflow-auto rounded-lg border border-ink-200 bg-white p-6 text-ink-900 shadow-xl backdrop:bg-ink-900/50"
    >
      <div className="mb-4 flex items-start justify-between gap-4">
        <div>
          <h2 id="player-keys-title" className="text-xl font-semibold">
            Player keys
          </h2>
          <p className="text-sm text-ink-600">They work while the player has focus, and when nothing else on the page has it. Fields keep their own keys.</p>
        </div>
        <button type="button" onClick={onClose} className="rounded-md border border-ink-200 px-3 py-1.5 text-sm font-semibold hover:bg-ink-50">
          Close
        </button>
      </div>
      <div className="grid gap-5 md:grid-cols-2 lg:grid-cols-3">
        {extraKeys.length > 0 && (
          <section>
            <h3 className="mb-1 text-sm font-semibold uppercase tracking-wide text-wick-700">On this page</h3>
            <Rows rows={extraKeys.map((k) => ({ keys: [k.key], label: k.label }))} />
          </section>
        )}
        {GROUPS.map((g) => (
          <section key={g}>
            <h3 className="mb-1 text-sm font-semibold uppercase tracking-wide text-wick-700">{g}</h3>
            <Rows rows={PLAYER_KEYS.filter((b) => b.group === g)} />
          </section>
        ))}
      </div>
    </dialog>
  );
}
