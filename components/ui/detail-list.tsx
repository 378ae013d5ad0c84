import type { ReactNode } from "react";

/** Label/value pairs in a responsive grid: two columns on a tablet, three or four on a desktop. */
export function DetailList({ items, wide = false }: { items: { label: string; value: ReactNode }[]; wide?: boolean }) {
  return (
    <dl className={`grid gap-x-6 gap-y-3 sm:grid-cols-2 ${wide ? "lg:grid-cols-3" : "lg:grid-cols-4"}`}>
      {items.map((i) => (
        <div key={i.label}>
          <dt className="text-xs font-semibold uppercase tracking-wide text-ink-600">{i.label}</dt>
          <dd className="mt-0.5 text-ink-900">{i.value}</dd>
        </div>
      ))}
    </dl>
  );
}
