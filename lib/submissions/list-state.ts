"use client";

import { UUID_PATTERN } from "@/lib/schema-parts";
import { usePathname, useSearchParams } from "next/navigation";
import { useCallback, useMemo } from "react";
import { KINDS, SORTS, STATUSES, type SubmissionKind, type SubmissionStatus } from "@/lib/submissions/schema";

// The list's filters, order and page live in the address, so a reload or a shared link keeps them.

export type SortKey = (typeof SORTS)[number];

export interface ListState {
  page: number;
  pageSize: number;
  sort: SortKey;
  dir: "asc" | "desc";
  organisationId?: string;
  kind?: SubmissionKind;
  status?: SubmissionStatus;
  round?: number;
  receivedFrom?: string;
  receivedTo?: string;
  q?: string;
}

export const DEFAULT_LIST: ListState = { page: 1, pageSize: 20, sort: "received", dir: "desc" };

const DAY = /^\d{4}-\d{2}-\d{2}$/;
const oneOf = <T extends string>(list: readonly T[], v: string | null): T | undefined => ((list as readonly string[]).includes(v ?? "") ? (v as T) : undefined);
const whole = (v: string | null, min: number, max: number): number | undefined => {
  const n = Number(v);
  return v && Number.isInteger(n) && n >= min && n <= max ? n : undefined;
};

/** What the address says, with anything the API would refuse left out rather than sent. */
export function readListState(sp: URLSearchParams): ListState {
  const day = (k: string) => (DAY.test(sp.get(k) ?? "") ? sp.get(k)! : undefined);
  return {
    page: whole(sp.get("page"), 1, 100_000) ?? DEFAULT_LIST.page,
    pageSize: whole(sp.get("pageSize"), 5, 100) ?? DEFAULT_LIST.pageSize,
    sort: oneOf(SORTS, sp.get("sort")) ?? DEFAULT_LIST.sort,
    dir: oneOf(["asc", "desc"] as const, sp.get("dir")) ?? DEFAULT_LIST.dir,
    organisationId: UUID_PATTERN.test(sp.get("organisationId") ?? "") ? sp.get("organisationId")! : undefined,
    kind: oneOf(KINDS, sp.get("kind")),
    status: oneOf(STATUSES, sp.get("status")),
    round: whole(sp.get("round"), 1, 1000),
    receivedFrom: day("receivedFrom"),
    receivedTo: day("receivedTo"),
    q: sp.get("q")?.trim().slice(0, 100) || undefined,
  };
}

/** The query string: defaults and blanks are left out, so links stay short. */
export function listSearch(state: ListState, keepDefaults = false): string {
  const out = new URLSearchParams();
  for (const [k, v] of Object.entries(state)) {
    if (v === undefined || v === "") continue;
    if (!keepDefaults && DEFAULT_LIST[k as keyof ListState] === v) continue;
    out.set(k, String(v));
  }
  return out.toString();
}

export function useListState() {
  const sp = useSearchParams();
  const pathname = usePathname();
  const state = useMemo(() => readListState(new URLSearchParams(sp.toString())), [sp]);
  /** A change of filter or order starts again at page 1; only paging keeps the page. */
  const update = useCallback(
    (patch: Partial<ListState>) => {
      const next = { ...state, page: 1, ...patch };
      const search = listSearch(next);
      // The History API keeps useSearchParams in step without asking the server to render the page again.
      window.history.replaceState(null, "", search ? `${pathname}?${search}` : pathname);
    },
    [state, pathname],
  );
  return { state, update };
}
