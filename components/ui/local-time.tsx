"use client";

import { useSyncExternalStore } from "react";
import { formatInstant } from "./dates";

const noSubscription = () => () => {};

/**
 * An instant in the reader's own zone and locale. The server does not know them, so it renders
 * nothing and the browser fills the time in after hydration.
 */
export function LocalTime({ iso }: { iso: string }) {
  const text = useSyncExternalStore(
    noSubscription,
    () => formatInstant(iso),
    () => null,
  );
  return <time dateTime={iso}>{text ?? "…"}</time>;
}
