// An event's before and after as a table of fields: what was, what is, and which changed.

type Flat = Map<string, string>;

function show(v: unknown): string {
  if (v === null || v === undefined) return "—";
  if (typeof v === "string") return v === "" ? "(empty)" : v;
  return String(v);
}

/** Nested objects become dotted keys; lists of plain values are joined, lists of objects numbered. */
export function flatten(v: unknown, prefix = "", out: Flat = new Map()): Flat {
  if (v !== null && typeof v === "object" && !Array.isArray(v)) {
    const entries = Object.entries(v as Record<string, unknown>);
    if (entries.length === 0 && prefix) out.set(prefix, "(none)");
    for (const [k, x] of entries) flatten(x, prefix ? `${prefix}.${k}` : k, out);
  } else if (Array.isArray(v)) {
    if (v.every((x) => x === null || typeof x !== "object")) out.set(prefix || "value", v.length ? v.map(show).join(", ") : "(none)");
    else v.forEach((x, i) => flatten(x, `${prefix}[${i + 1}]`, out));
  } else {
    out.set(prefix || "value", show(v));
  }
  return out;
}

export function diffRows(before: unknown, after: unknown): { key: string; before: string | null; after: string | null; changed: boolean }[] {
  const b = before === null || before === undefined ? null : flatten(before);
  const a = after === null || after === undefined ? null : flatten(after);
  const keys = [...new Set([...(b?.keys() ?? []), ...(a?.keys() ?? [])])];
  return keys.map((key) => {
    const x = b ? (b.get(key) ?? null) : null;
    const y = a ? (a.get(key) ?? null) : null;
    return { key, before: x, after: y, changed: b !== null && a !== null && x !== y };
  });
}

export function ChangeDiff({ before, after }: { before: unknown; after: unknown }) {
  const rows = diffRows(before, after);
  if (rows.length === 0) return <p className="text-sm text-ink-600">No details were recorded with this event.</p>;
  const both = before !== null && before !== undefined && after !== null && after !== undefined;
  return (
    <table className="w-full table-fixed text-left text-sm">
      <thead className="text-xs uppercase tracking-wide text-ink-600">
        <tr>
          <th scope="col" className="w-1/4 py-1 pr-3">Field</th>
          <th scope="col" className="py-1 pr-3">Before</th>
          <th scope="col" className="py-1">After</th>
        </tr>
      </thead>
      <tbody>
        {rows.map((r) => (
          <tr key={r.key} className={`border-t border-ink-100 align-top ${r.changed ? "bg-wick-100" : ""}`} data-key={r.key} data-changed={r.changed || undefined}>
            <th scope="row" className="break-words py-1 pr-3 font-mono text-xs font-normal">
              {r.key}
              {r.changed && <span className="ml-1 font-sans font-semibold text-wick-700">changed</span>}
            </th>
            <td className="break-words py-1 pr-3 text-ink-600">{r.before ?? (both ? "(not set)" : "—")}</td>
            <td className="break-words py-1">{r.after ?? (both ? "(not set)" : "—")}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
