"use client";

import { Button } from "./button";

export const PAGE_SIZES = [10, 20, 50, 100] as const;

/** "Showing 21–40 of 57", the page size, and previous/next. */
export function Pager({
  page,
  pageSize,
  total,
  onPage,
  onPageSize,
  label,
}: {
  page: number;
  pageSize: number;
  total: number;
  onPage: (p: number) => void;
  onPageSize: (n: number) => void;
  label: string;
}) {
  const first = (page - 1) * pageSize + 1;
  const last = Math.min(page * pageSize, total);
  const shown = first <= last ? `Showing ${first}–${last} of ${total}` : `Showing none of ${total}`;
  const pages = Math.max(1, Math.ceil(total / pageSize));
  return (
    <nav aria-label={label} className="flex flex-wrap items-center justify-between gap-3 text-sm">
      <p aria-live="polite">{shown}</p>
      <div className="flex flex-wrap items-center gap-3">
        <label className="flex items-center gap-2">
          Rows per page
          <select value={pageSize} onChange={(e) => onPageSize(Number(e.target.value))} className="rounded-md border border-ink-200 bg-white px-2 py-1.5">
            {PAGE_SIZES.map((n) => (
              <option key={n} value={n}>
                {n}
              </option>
            ))}
          </select>
        </label>
        <Button type="button" kind="secondary" onClick={() => onPage(page - 1)} disabled={page <= 1}>
          Previous page
        </Button>
        <span>
          Page {Math.min(page, pages)} of {pages}
        </span>
        <Button type="button" kind="secondary" onClick={() => onPage(page + 1)} disabled={page >= pages}>
          Next page
        </Button>
      </div>
    </nav>
  );
}
