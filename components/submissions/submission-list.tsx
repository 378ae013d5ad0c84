"use client";

import { createColumnHelper } from "@tanstack/react-table";
import Link from "next/link";
import { useMemo } from "react";
import { DataTable } from "@/components/ui/data-table";
import { formatDay } from "@/components/ui/dates";
import { Notice } from "@/components/ui/notice";
import { Pager } from "@/components/ui/pager";
import { listSearch, useListState, type SortKey } from "@/lib/submissions/list-state";
import { KIND_LABELS, StatusBadge } from "@/components/submissions/submission-labels";
import { useSubmissionPage, type SubmissionRow } from "@/lib/submissions/hooks";

const col = createColumnHelper<SubmissionRow>();

/** "⚠ 1 flagged": runs with condition warnings that no lead has accepted. */
function FlaggedBadge({ n }: { n: number | undefined }) {
  if (!n)
    return (
      <span className="text-ink-600">
        <span aria-hidden="true">—</span>
        <span className="sr-only">none</span>
      </span>
    );
  return (
    <span
      className="whitespace-nowrap rounded-full bg-wick-100 px-2 py-0.5 text-xs font-semibold text-wick-700"
      title={`${n} run${n === 1 ? "" : "s"} with condition warnings not yet accepted`}
    >
      <span aria-hidden="true">⚠ </span>
      {n} flagged<span className="sr-only"> run{n === 1 ? "" : "s"}</span>
    </span>
  );
}

/** The released report of a submission, for the manufacturer's list; a dash until a lead signs the results off. */
function ReportLink({ row }: { row: SubmissionRow }) {
  if (row.status !== "released")
    return (
      <span className="text-ink-600">
        <span aria-hidden="true">—</span>
        <span className="sr-only">not released yet</span>
      </span>
    );
  return (
    <a href={`/api/submissions/${row.id}/report.pdf`} download className="whitespace-nowrap font-semibold text-wick-700 underline">
      Released report (PDF)<span className="sr-only"> of {row.reference}</span>
    </a>
  );
}

function columns(basePath: string, withOrganisation: boolean) {
  return [
    col.accessor("reference", {
      id: "reference",
      header: "Reference",
      cell: (c) => (
        <Link href={`${basePath}/${c.row.original.id}`} className="whitespace-nowrap font-semibold text-wick-700 underline">
          {c.getValue()}
        </Link>
      ),
    }),
    col.accessor("modelName", { id: "model", header: "Model" }),
    ...(withOrganisation ? [col.accessor("organisationName", { id: "organisation", header: "Organisation" })] : []),
    col.accessor("kind", { id: "kind", header: "Kind", cell: (c) => KIND_LABELS[c.getValue()] }),
    col.accessor("status", { id: "status", header: "Status", cell: (c) => <StatusBadge status={c.getValue()} /> }),
    ...(withOrganisation
      ? [col.accessor("flaggedRuns", { id: "flagged", header: "Conditions", enableSorting: false, cell: (c) => <FlaggedBadge n={c.getValue()} /> })]
      : []),
    col.accessor("currentRound", { id: "round", header: "Round" }),
    ...(withOrganisation ? [col.accessor("sampleCount", { id: "samples", header: "Samples", enableSorting: false })] : []),
    col.accessor("receivedOn", { id: "received", header: "Received", cell: (c) => <span className="whitespace-nowrap">{formatDay(c.getValue())}</span> }),
    // The manufacturer's list (no organisation column) links each released report.
    ...(withOrganisation ? [] : [col.display({ id: "report", header: "Report", cell: (c) => <ReportLink row={c.row.original} /> })]),
  ];
}

/** The submissions table, paged, sorted and filtered by the server from what the address says. */
export function SubmissionList({
  caption,
  basePath,
  withOrganisation = true,
  emptyText = "No submissions match.",
}: {
  caption: string;
  basePath: string;
  withOrganisation?: boolean;
  emptyText?: string;
}) {
  const { state, update } = useListState();
  const list = useSubmissionPage(listSearch(state, true));
  const cols = useMemo(() => columns(basePath, withOrganisation), [basePath, withOrganisation]);

  if (list.isPending)
    return (
      <p className="text-ink-600" role="status">
        Loading submissions…
      </p>
    );
  if (list.isError) return <Notice tone="error">{list.error.message}</Notice>;
  const { rows, total } = list.data;
  // A shared link may point past the end after records changed; offer the last page instead of nothing.
  const lastPage = Math.max(1, Math.ceil(total / state.pageSize));
  return (
    <div className="space-y-3" aria-busy={list.isFetching}>
      <DataTable
        caption={caption}
        columns={cols}
        data={rows}
        rowKey={(r) => r.id}
        sort={{ id: state.sort, desc: state.dir === "desc" }}
        onSort={(s) => update({ sort: s.id as SortKey, dir: s.desc ? "desc" : "asc" })}
        empty={state.page > lastPage ? "This page is past the end of the list." : emptyText}
      />
      <Pager
        label="Submission pages"
        page={state.page}
        pageSize={state.pageSize}
        total={total}
        onPage={(page) => update({ page: Math.min(Math.max(1, page), lastPage) })}
        onPageSize={(pageSize) => update({ pageSize })}
      />
    </div>
  );
}
