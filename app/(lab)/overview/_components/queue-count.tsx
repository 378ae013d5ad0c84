"use client";

import Link from "next/link";
import { useWorkQueue } from "@/lib/drops/hooks";

/** How many drops wait for the signed-in reviewer, as a way into the queue. */
export function QueueCount() {
  const q = useWorkQueue();
  const n = q.data?.length;
  const words =
    n === undefined ? "Your reading queue" : n === 0 ? "No drops waiting for your reading" : `${n} drop${n === 1 ? "" : "s"} waiting for your reading`;
  return (
    <p className="mt-4 border-t border-ink-100 pt-3">
      <Link href="/queue" className="font-semibold text-wick-700 underline">
        {words}
      </Link>
    </p>
  );
}
