"use client";

import Link from "next/link";
import { ConditionWarnings } from "@/components/ui/condition-warnings";
import { formatInstant } from "@/components/ui/dates";
import type { RunView } from "@/lib/runs/view";
import { formatTemperature } from "@/lib/units/rules";

export function SampleRuns({ serial, runs }: { serial: string; runs: RunView[] }) {
  return (
    <ul aria-label={`Runs of sample ${serial}`} className="space-y-2 border-l-2 border-ink-100 pl-3">
      {runs.map((r) => (
        <li key={r.id} className="space-y-1">
          <p>
            <Link href={`/runs/${r.id}`} className="font-semibold text-wick-700 underline">
              Run tested {formatInstant(r.testedAt)}
            </Link>
            <span className="text-ink-600">
              {" "}
              · by {r.technicianName} · surface {formatTemperature(r.surfaceTempC)}
            </span>
            {r.voidedAt && <span className="ml-2 rounded bg-ink-100 px-1.5 py-0.5 text-xs font-semibold uppercase text-ink-700">Voided</span>}
          </p>
          {r.voidedAt ? (
            <p className="text-sm text-ink-600">
              Voided by {r.voidedByName} on {formatInstant(r.voidedAt)}; it no longer counts. Reason: {r.voidReason}
            </p>
          ) : (
            r.flags.length > 0 && <ConditionWarnings run={r} />
          )}
        </li>
      ))}
    </ul>
  );
}
