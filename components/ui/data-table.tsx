"use client";

import { flexRender, getCoreRowModel, useReactTable, type ColumnDef, type SortingState } from "@tanstack/react-table";

export interface Sort {
  id: string;
  desc: boolean;
}

/**
 * A table whose rows, order and page come from the server: TanStack Table only lays it out.
 * Sortable headers are buttons inside <th aria-sort>, so the order is announced.
 */
export function DataTable<T>({
  caption,
  columns,
  data,
  sort,
  onSort,
  rowKey,
  empty,
}: {
  caption: string;
  // biome-ignore lint/suspicious/noExplicitAny: a table's columns hold values of different types (TanStack's own idiom)
  columns: ColumnDef<T, any>[];
  data: T[];
  sort: Sort;
  onSort: (s: Sort) => void;
  rowKey: (row: T) => string;
  empty: string;
}) {
  const sorting: SortingState = [sort];
  const table = useReactTable({
    data,
    columns,
    getCoreRowModel: getCoreRowModel(),
    getRowId: rowKey,
    manualSorting: true,
    manualPagination: true,
    enableMultiSort: false,
    state: { sorting },
    onSortingChange: (updater) => {
      const next = typeof updater === "function" ? updater(sorting) : updater;
      if (next[0]) onSort({ id: next[0].id, desc: next[0].desc });
    },
  });

  return (
    <div className="overflow-x-auto rounded-lg border border-ink-100 bg-white shadow-sm">
      <table className="w-full text-left text-sm">
        <caption className="sr-only">{caption}</caption>
        <thead className="bg-ink-50 text-ink-600">
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((h) => {
                const active = sort.id === h.column.id;
                const label = flexRender(h.column.columnDef.header, h.getContext());
                return (
                  <th
                    key={h.id}
                    scope="col"
                    className="px-3 py-2 font-semibold"
                    aria-sort={h.column.getCanSort() ? (active ? (sort.desc ? "descending" : "ascending") : "none") : undefined}
                  >
                    {h.column.getCanSort() ? (
                      <button
                        type="button"
                        onClick={() => onSort({ id: h.column.id, desc: active ? !sort.desc : false })}
                        className="inline-flex items-center gap-1 rounded hover:text-ink-900"
                      >
                        {label}
                        <span aria-hidden="true" className="text-xs">
                          {active ? (sort.desc ? "▼" : "▲") : "↕"}
                        </span>
                      </button>
                    ) : (
                      label
                    )}
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((row) => (
            <tr key={row.id} className="border-t border-ink-100">
              {row.getVisibleCells().map((cell) => (
                <td key={cell.id} className="px-3 py-2 align-top">
                  {flexRender(cell.column.columnDef.cell, cell.getContext())}
                </td>
              ))}
            </tr>
          ))}
          {data.length === 0 && (
            <tr>
              <td colSpan={columns.length} className="px-3 py-6 text-center text-ink-600">
                {empty}
              </td>
            </tr>
          )}
        </tbody>
      </table>
    </div>
  );
}
