"use client";

import { useState } from "react";

/** A lead's reason for a decision on a run (accept, void): said in a sentence, at least `min` characters. */
export function useReason(min = 10) {
  const [reason, setReason] = useState("");
  const [own, setOwn] = useState<string | null>(null);
  /** The trimmed reason, or null after saying in the field what is missing. */
  const checked = (): string | null => {
    const text = reason.trim();
    if (text.length < min) {
      setOwn(`Write the reason in a sentence (at least ${min} characters).`);
      return null;
    }
    setOwn(null);
    return text;
  };
  return { reason, setReason, own, checked };
}
