// A drop's states, and the sets of them every rule uses: defined once here, imported by the
// server and the browser alike. Pure.

export const DROP_STATES = ["unread", "read once", "agreed", "discrepancy", "ruled", "signed off"] as const;
export type DropState = (typeof DROP_STATES)[number];

/** Still being read blind: no reviewer may see another's reading, nor the drop's state. */
export const BEING_READ_STATES = ["unread", "read once"] as const satisfies readonly DropState[];
/** Settled: its time counts in the results. */
export const SETTLED_STATES = ["agreed", "ruled", "signed off"] as const satisfies readonly DropState[];
/** Settled and not yet signed off: what a sign-off turns into "signed off", and a re-opening back. */
export const SIGNABLE_STATES = ["agreed", "ruled"] as const satisfies readonly DropState[];

export const isBeingRead = (state: string | null): boolean => state !== null && (BEING_READ_STATES as readonly string[]).includes(state);
export const isSettled = (state: string | null): boolean => state !== null && (SETTLED_STATES as readonly string[]).includes(state);
