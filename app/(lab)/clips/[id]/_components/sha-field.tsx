"use client";

import { useState } from "react";

/** The SHA-256 in full, in monospace, with a button that copies it. */
export function ShaField({ sha256 }: { sha256: string }) {
  const [copied, setCopied] = useState<"yes" | "no" | null>(null);
  async function copy() {
    try {
      await navigator.clipboard.writeText(sha256);
      setCopied("yes");
    } catch {
      setCopied("no");
    }
  }
  return (
    <div className="flex flex-wrap items-center gap-2">
      <code className="break-all rounded bg-ink-50 px-1.5 py-0.5 font-mono text-sm">
        <span className="sr-only">SHA-256: </span>
        {sha256}
      </code>
      <button type="button" onClick={() => void copy()} className="rounded-md border border-ink-200 bg-white px-2 py-1 text-xs font-semibold hover:bg-ink-50">
        Copy<span className="sr-only"> the SHA-256</span>
      </button>
      <span role="status" className="text-xs text-ink-600">
        {copied === "yes" ? "Copied." : copied === "no" ? "The browser did not allow copying: select the text instead." : ""}
      </span>
    </div>
  );
}
