import { REFERENCE, type ReferenceKind } from "./theme";

/** A legend of reference lines drawn with their own stroke and dash, in HTML beside the chart. */
export function ReferenceLegend({ items }: { items: { kind: ReferenceKind; label: string }[] }) {
  return (
    <ul className="flex flex-wrap gap-x-6 gap-y-1 text-sm text-ink-800" aria-label="Lines on the chart">
      {items.map((it) => {
        const s = REFERENCE[it.kind];
        return (
          <li key={it.label} className="flex items-center gap-2">
            <svg width="36" height="10" aria-hidden="true">
              <line x1="0" y1="5" x2="36" y2="5" stroke={s.stroke} strokeWidth={s.strokeWidth + 0.5} strokeDasharray={s.strokeDasharray} />
            </svg>
            {it.label}
          </li>
        );
      })}
    </ul>
  );
}
