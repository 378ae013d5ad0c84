"use client";

import { useCallback, useEffect, useRef, useState } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { SelectField } from "@/components/ui/select-field";
import { KINDS, STATUS_LABELS, STATUSES } from "@/lib/submissions/schema";
import { useListState, type ListState } from "@/lib/submissions/list-state";
import { useOrganisationList } from "@/lib/organisations/hooks";
import { KIND_LABELS } from "@/components/submissions/submission-labels";

const SEARCH_DELAY_MS = 400;

export function SubmissionFilters() {
  const { state, update } = useListState();
  const organisations = useOrganisationList();
  const [q, setQ] = useState(state.q ?? "");
  const sent = useRef(state.q ?? "");

  const search = useCallback(
    (text: string) => {
      sent.current = text.trim();
      update({ q: text.trim() || undefined });
    },
    [update],
  );
  // Typing waits for a pause before it changes the address (and asks the server again).
  useEffect(() => {
    if (q.trim() === sent.current) return;
    const t = setTimeout(() => search(q), SEARCH_DELAY_MS);
    return () => clearTimeout(t);
  }, [q, search]);
  // Only a change that did not come from this box (such as "Clear filters") replaces what is typed.
  useEffect(() => {
    if ((state.q ?? "") !== sent.current) {
      sent.current = state.q ?? "";
      setQ(state.q ?? "");
    }
  }, [state.q]);

  const set = (key: keyof ListState) => (e: { target: { value: string } }) => update({ [key]: e.target.value || undefined });
  const active = state.organisationId || state.kind || state.status || state.round || state.receivedFrom || state.receivedTo || state.q;

  return (
    <section aria-labelledby="filters-heading" className="rounded-lg border border-ink-100 bg-white p-4 shadow-sm">
      <h2 id="filters-heading" className="sr-only">
        Filters
      </h2>
      {/* biome-ignore lint/a11y/useSemanticElements: a search form; the <search> element is newer than some browsers labs keep */}
      <form
        role="search"
        aria-label="Filter submissions"
        onSubmit={(e) => {
          e.preventDefault();
          search(q);
        }}
        className="grid gap-3 md:grid-cols-3 lg:grid-cols-4"
      >
        <Field id="filter-q" label="Search reference or model" type="search" value={q} onChange={(e) => setQ(e.target.value)} maxLength={100} />
        <SelectField
          id="filter-organisation"
          label="Organisation"
          value={state.organisationId ?? ""}
          onChange={set("organisationId")}
          error={organisations.isError ? organisations.error.message : undefined}
        >
          <option value="">All organisations</option>
          {organisations.data?.map((o) => (
            <option key={o.id} value={o.id}>
              {o.name}
            </option>
          ))}
        </SelectField>
        <SelectField id="filter-kind" label="Kind" value={state.kind ?? ""} onChange={set("kind")}>
          <option value="">All kinds</option>
          {KINDS.map((k) => (
            <option key={k} value={k}>
              {KIND_LABELS[k]}
            </option>
          ))}
        </SelectField>
        <SelectField id="filter-status" label="Status" value={state.status ?? ""} onChange={set("status")}>
          <option value="">All statuses</option>
          {STATUSES.map((s) => (
            <option key={s} value={s}>
              {STATUS_LABELS[s]}
            </option>
          ))}
        </SelectField>
        <Field
          id="filter-round"
          label="Current round"
          type="number"
          min={1}
          step={1}
          inputMode="numeric"
          value={state.round ?? ""}
          onChange={(e) => update({ round: Number(e.target.value) >= 1 ? Math.floor(Number(e.target.value)) : undefined })}
        />
        <Field id="filter-from" label="Received from" type="date" value={state.receivedFrom ?? ""} onChange={set("receivedFrom")} />
        <Field id="filter-to" label="Received to" type="date" value={state.receivedTo ?? ""} onChange={set("receivedTo")} />
        <div className="flex items-end gap-2">
          <Button type="submit" kind="secondary">
            Search
          </Button>
          {active && (
            <Button
              type="button"
              kind="secondary"
              onClick={() =>
                update({
                  organisationId: undefined,
                  kind: undefined,
                  status: undefined,
                  round: undefined,
                  receivedFrom: undefined,
                  receivedTo: undefined,
                  q: undefined,
                })
              }
            >
              Clear filters
            </Button>
          )}
        </div>
      </form>
    </section>
  );
}
