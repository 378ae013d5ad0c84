import Link from "next/link";
import type { DropView } from "@/lib/drops/hooks";
import { DropStateBadge } from "@/components/drops/drop-state";

/** Which drop this is, where it sits, and what the viewer may know of its state. */
export function DropHeader({ drop }: { drop: DropView }) {
  return (
    <div>
      <p className="flex flex-wrap gap-x-4 text-sm">
        <Link href={`/runs/${drop.runId}`} className="font-semibold text-wick-700 underline">
          Back to the run
        </Link>
        <Link href="/queue" className="font-semibold text-wick-700 underline">
          Reading queue
        </Link>
      </p>
      <p className="mt-2 text-sm font-semibold uppercase tracking-wide text-wick-700">
        <Link href={`/submissions/${drop.submissionId}`} className="underline">
          {drop.submissionReference}
        </Link>{" "}
        · sample {drop.sampleSerial}
      </p>
      <h1 className="text-3xl font-bold">Drop {drop.ordinal}</h1>
      <p className="mt-2 flex flex-wrap items-center gap-3 text-sm text-ink-700">
        <DropStateBadge drop={drop} />
        {drop.blind && <span className="font-semibold text-ink-800">Blind reading: other readings stay hidden until both are in.</span>}
        {drop.clip && (
          <span>
            On clip{" "}
            <Link href={`/clips/${drop.clip.id}`} className="font-semibold underline">
              {drop.clip.name}
            </Link>
            , near frame {drop.startFrame}
          </span>
        )}
        <span>Agreement tolerance {drop.readingToleranceS} s (from the submission&apos;s edition)</span>
      </p>
    </div>
  );
}
