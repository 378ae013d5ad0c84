// An event's before and after as a table of fields: what was, what is, and which changed. An event
// that holds only one side (a record created, a sign-in) shows that side alone.

import { diffRows } from "./diff-rows";

const given = (v: unknown) => v !== null && v !== undefined;

export function ChangeDiff({ before, after }: { before: unknown; after: unknown }) {
  const rows = diffRows(before, after);
  if (rows.length === 0) return <p className="text-sm text-ink-600">No details were recorded with this event.</p>;
  const [hasBefore, hasAfter] = [given(before), given(after)];
  const both = hasBefore && hasAfter;
  return (
    <table className="w-full table-fixed text-left text-sm">
      <thead className="text-xs uppercase tracking-wide text-ink-600">
        <tr>
          <th scope="col" className="w-1/4 py-1 pr-3">
            Field
          </th>
          {hasBefore && (
            <th scope="col" className="py-1 pr-3">
              Before
            </th>
          )}
          {hasAfter && (
            <th scope="col" className="py-1">
              {both ? "After" : "Recorded"}
            </th>
          )}
        </tr>
      </thead>
      <tbody>
        {rows.map((r) => (
          <tr key={r.key} className={`border-t border-ink-100 align-top ${r.change ? "bg-wick-100" : ""}`} data-key={r.key} data-change={r.change ?? undefined}>
            <th scope="row" className="break-words py-1 pr-3 font-mono text-xs font-normal">
              {r.key}
              {r.change && <span className="ml-1 font-sans font-semibold text-wick-700">{r.change}</span>}
            </th>
            {hasBefore && <td className="break-words py-1 pr-3 text-ink-600">{r.before ?? "(not set)"}</td>}
            {hasAfter && <td className="break-words py-1">{r.after ?? "(not set)"}</td>}
          </tr>
        ))}
      </tbody>
    </table>
  );
}
