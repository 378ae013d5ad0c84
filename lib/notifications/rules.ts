// The kinds of mail Wickmark sends, which of them a person may switch off, and the retry timing.
// Pure: no database, no SMTP.

// `roles`: who receives the kind; `why`: what an essential one is for, shown where it cannot be switched off.
export const KINDS = {
  "discrepancy.new": { label: "A new discrepancy between two readings (leads)", essential: false, roles: ["lead"], why: null },
  "ball.below_limit": {
    label: "A ball below the limit during testing (manufacturers)",
    essential: true,
    roles: ["manufacturer"],
    why: "a ball of your model failing the minimum during testing is something you are told at once, whatever your other settings.",
  },
  "samples.requested": {
    label: "More samples requested (manufacturers)",
    essential: true,
    roles: ["manufacturer"],
    why: "testing cannot go on until you send the samples, so the request always reaches you.",
  },
  "results.released": {
    label: "Results released (manufacturers)",
    essential: true,
    roles: ["manufacturer"],
    why: "the release of your results and test report is the outcome of your submission.",
  },
  "reviewer.digest": { label: "Daily digest of drops waiting for you (reviewers)", essential: false, roles: ["reviewer"], why: null },
} as const satisfies Record<string, { label: string; essential: boolean; roles: readonly string[]; why: string | null }>;

export type MailKind = keyof typeof KINDS;
export const OPTIONAL_KINDS = (Object.keys(KINDS) as MailKind[]).filter((k) => !KINDS[k].essential);

/** Whether a person who switched `optOut` off still gets mail of this kind: essential mail always goes. */
export function wantsMail(kind: MailKind, optOut: readonly string[]): boolean {
  return KINDS[kind].essential || !optOut.includes(kind);
}

/** Wait before the next attempt after `attempts` failed ones: base, 2×, 4× … capped at 30 min. */
export function retryDelaySeconds(attempts: number, baseSeconds = 30): number {
  return Math.min(baseSeconds * 2 ** Math.max(0, attempts - 1), 1800);
}

/** After this many failed attempts a row stays `failed` and is shown to the leads; nobody retries it. */
export const MAX_ATTEMPTS = 12;

/**
 * A fixed Message-ID per outbox row. Delivery is at least once: if a worker dies after the server
 * accepted a message but before the row is marked sent, the row is tried again once its lease ends,
 * and the copy carries the same Message-ID so mail systems can recognise it as the same message.
 */
export function messageIdOf(rowId: string, fromAddress: string): string {
  const domain = /@([^>\s]+)/.exec(fromAddress)?.[1] ?? "wickmark.invalid";
  return `<outbox-${rowId}@${domain}>`;
}
