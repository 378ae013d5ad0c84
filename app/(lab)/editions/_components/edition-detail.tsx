"use client";

import Link from "next/link";
import { ButtonLink } from "@/components/ui/button";
import { formatDay, formatInstant } from "@/components/ui/dates";
import { Notice } from "@/components/ui/notice";
import { useEdition } from "@/lib/editions/hooks";
import { displayValue, EDITION_VALUES } from "./edition-fields";

export function EditionDetail({ id, isLead }: { id: string; isLead: boolean }) {
  const q = useEdition(id);
  if (q.isPending)
    return (
      <p className="text-ink-600" role="status">
        Loading the edition…
      </p>
    );
  if (q.isError) return <Notice tone="error">{q.error.message}</Notice>;
  const e = q.data;
  const inUse = e.usedBy.length > 0;

  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <p className="text-sm font-semibold uppercase tracking-wide text-wick-700">Specification edition</p>
          <h1 className="text-3xl font-bold">{e.name}</h1>
          <p className="mt-1 text-ink-600">
            In force from {formatDay(e.effectiveFrom)} · entered {formatInstant(e.createdAt)}
            {e.basedOnId && (
              <>
                {" "}
                · made from{" "}
                <Link href={`/editions/${e.basedOnId}`} className="font-semibold text-wick-700 underline">
                  an earlier edition
                </Link>
              </>
            )}
          </p>
        </div>
        {isLead && (
          <div className="flex flex-wrap gap-2">
            {!inUse && (
              <ButtonLink kind="secondary" href={`/editions/${e.id}/edit`}>
                Correct this edition
              </ButtonLink>
            )}
            <ButtonLink href={`/editions/new?from=${e.id}`}>New edition from this one</ButtonLink>
          </div>
        )}
      </div>
      <Notice tone="info">
        {inUse
          ? `${e.usedBy.length} submission${e.usedBy.length === 1 ? " is" : "s are"} judged against this edition, so its values can no longer change. To use other values, make a new edition from this one with a later effective date.`
          : "No submission uses this edition yet, so a lead can still correct it. Once a submission is received under it, it cannot change."}
      </Notice>

      <div className="overflow-x-auto rounded-lg border border-ink-100 bg-white shadow-sm">
        <table className="w-full text-left text-sm">
          <caption className="px-4 pt-3 text-left font-semibold text-ink-900">Values and where each comes from</caption>
          <thead className="bg-ink-50 text-ink-600">
            <tr>
              <th scope="col" className="px-3 py-2">
                Setting
              </th>
              <th scope="col" className="px-3 py-2">
                Value
              </th>
              <th scope="col" className="px-3 py-2">
                Source
              </th>
            </tr>
          </thead>
          <tbody>
            {EDITION_VALUES.map((m) => (
              <tr key={m.key} className="border-t border-ink-100 align-top">
                <th scope="row" className="px-3 py-2 font-semibold">
                  {m.label}
                </th>
                <td className="whitespace-nowrap px-3 py-2">{displayValue(e, m.key)}</td>
                <td className="px-3 py-2 text-ink-800">{e.sources[m.key] || <span className="text-wick-700">No source given.</span>}</td>
              </tr>
            ))}
          </tbody>
        </table>
        {e.notes && <p className="whitespace-pre-wrap border-t border-ink-100 px-4 py-3 text-sm text-ink-800">{e.notes}</p>}
      </div>

      <section aria-labelledby="used-by-heading" className="space-y-2">
        <h2 id="used-by-heading" className="text-xl font-semibold">
          Submissions judged against it
        </h2>
        {inUse ? (
          <ul className="list-disc space-y-1 pl-5">
            {e.usedBy.map((s) => (
              <li key={s.id}>
                <Link href={`/submissions/${s.id}`} className="font-semibold text-wick-700 underline">
                  {s.reference}
                </Link>{" "}
                · {s.modelName}
              </li>
            ))}
          </ul>
        ) : (
          <p className="text-ink-600">None yet.</p>
        )}
      </section>
    </div>
  );
}
