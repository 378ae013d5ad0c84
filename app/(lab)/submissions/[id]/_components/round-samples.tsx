"use client";

import Link from "next/link";
import { Fragment } from "react";
import { formatInstant } from "@/components/ui/dates";
import type { StaffSubmissionDetail } from "@/lib/submissions/view";
import { formatWeight } from "@/lib/units/rules";
import { SampleRuns } from "./sample-runs";

type Sample = StaffSubmissionDetail["rounds"][number]["samples"][number];

/** One round's sample balls; each ball's runs sit in the row beneath it. */
export function RoundSamples({ round, samples, canEdit }: { round: number; samples: Sample[]; canEdit: boolean }) {
  const cols = canEdit ? 6 : 5;
  return (
    <section aria-labelledby={`round-${round}`} className="overflow-x-auto rounded-lg border border-ink-100 bg-white shadow-sm">
      <h3 id={`round-${round}`} className="px-4 pt-3 font-semibold">
        Round {round}{" "}
        <span className="font-normal text-ink-600">
          · {samples.length} sample{samples.length === 1 ? "" : "s"}
        </span>
      </h3>
      <table className="mt-2 w-full text-left text-sm">
        <caption className="sr-only">Samples of round {round}, with their runs</caption>
        <thead className="bg-ink-50 text-ink-600">
          <tr>
            <th scope="col" className="px-3 py-2">
              Serial
            </th>
            <th scope="col" className="px-3 py-2">
              Weight
            </th>
            <th scope="col" className="px-3 py-2">
              Received
            </th>
            <th scope="col" className="px-3 py-2">
              Acclimation start
            </th>
            <th scope="col" className="px-3 py-2">
              Runs
            </th>
            {canEdit && (
              <th scope="col" className="px-3 py-2">
                <span className="sr-only">Actions</span>
              </th>
            )}
          </tr>
        </thead>
        <tbody>
          {samples.map((s) => (
            <Fragment key={s.id}>
              <tr className="border-t border-ink-100">
                <th scope="row" className="whitespace-nowrap px-3 py-2 font-semibold">
                  {s.serial}
                </th>
                <td className="px-3 py-2">{formatWeight(s.weightG)}</td>
                <td className="px-3 py-2">{formatInstant(s.receivedAt)}</td>
                <td className="px-3 py-2">
                  {s.acclimationStartedAt ? formatInstant(s.acclimationStartedAt) : <span className="text-wick-700">not recorded</span>}
                </td>
                <td className="px-3 py-2">{s.runCount}</td>
                {canEdit && (
                  <td className="px-3 py-2 text-right">
                    <Link href={`/samples/${s.id}/runs/new`} className="whitespace-nowrap font-semibold text-wick-700 underline">
                      Record run<span className="sr-only"> on sample {s.serial}</span>
                    </Link>
                  </td>
                )}
              </tr>
              {s.runs.length > 0 && (
                <tr>
                  <td colSpan={cols} className="px-3 pb-3">
                    <SampleRuns serial={s.serial} runs={s.runs} />
                  </td>
                </tr>
              )}
            </Fragment>
          ))}
        </tbody>
      </table>
    </section>
  );
}
