// An audit event's before and after, flattened to fields and compared. Pure.

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

export type Change = "changed" | "added" | "removed" | null;

/** Field by field; a change is marked only when the event holds both a before and an after. */
export function diffRows(before: unknown, after: unknown): { key: string; before: string | null; after: string | null; change: Change }[] {
  const b = before === null || before === undefined ? null : flatten(before);
  const a = after === null || after === undefined ? null : flatten(after);
  const keys = [...new Set([...(b?.keys() ?? []), ...(a?.keys() ?? [])])];
  return keys.map((key) => {
    const x = b ? (b.get(key) ?? null) : null;
    const y = a ? (a.get(key) ?? null) : null;
    const change: Change = !b || !a || x === y ? null : x === null ? "added" : y === null ? "removed" : "changed";
    return { key, before: x, after: y, change };
  });
}
