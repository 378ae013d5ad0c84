"use client";

import { useState, type FormEvent } from "react";
import { auditSearch, useAuditPeople, type AuditFilters } from "@/lib/audit/hooks";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { SelectField } from "@/components/ui/select-field";
import { KNOWN_ACTIONS, RECORD_KINDS } from "./audit-words";

type Draft = Required<Pick<AuditFilters, "actorId" | "action" | "entity" | "entityId" | "from" | "to">>;
const BLANK: Draft = { actorId: "", action: "", entity: "", entityId: "", from: "", to: "" };
const draftOf = (f: AuditFilters): Draft => ({
  actorId: f.actorId ?? "",
  action: f.action ?? "",
  entity: f.entity ?? "",
  entityId: f.entityId ?? "",
  from: f.from ?? "",
  to: f.to ?? "",
});

/** Who, what, which record and when; applied together, and kept in the address. */
export function AuditFiltersForm({
  filters,
  errors,
  busy,
  onApply,
}: {
  filters: AuditFilters;
  errors: Record<string, string>;
  busy: boolean;
  onApply: (f: Draft) => void;
}) {
  const people = useAuditPeople();
  const [draft, setDraft] = useState<Draft>(draftOf(filters));
  const [shown, setShown] = useState(auditSearch(filters));
  // A change made elsewhere (a record picked from the list, say) replaces what the form shows.
  if (shown !== auditSearch(filters)) {
    setShown(auditSearch(filters));
    setDraft(draftOf(filters));
  }
  const set = (k: keyof Draft) => (e: { target: { value: string } }) => setDraft({ ...draft, [k]: e.target.value });
  // What the form asks for is what it shows from now on, so the address catching up resets nothing typed since.
  const apply = (d: Draft) => {
    setDraft(d);
    setShown(auditSearch({ ...d, pageSize: filters.pageSize }));
    onApply(d);
  };
  const submit = (e: FormEvent) => {
    e.preventDefault();
    apply(draft);
  };
  return (
    <form onSubmit={submit} aria-label="Filters" className="grid gap-4 rounded-lg border border-ink-100 bg-white p-4 shadow-sm sm:grid-cols-2 lg:grid-cols-6">
      <div className="lg:col-span-2">
        <SelectField id="audit-who" label="Who" value={draft.actorId} onChange={set("actorId")} error={errors.actorId}>
          <option value="">Anyone</option>
          {people.data?.map((u) => (
            <option key={u.id} value={u.id}>
              {u.name} ({u.email})
            </option>
          ))}
        </SelectField>
      </div>
      <div className="lg:col-span-2">
        <Field
          id="audit-action"
          label="Action (or its start, e.g. reading.)"
          list="audit-actions"
          value={draft.action}
          onChange={set("action")}
          error={errors.action}
        />
        <datalist id="audit-actions">
          {KNOWN_ACTIONS.map((a) => (
            <option key={a} value={a} />
          ))}
        </datalist>
      </div>
      <Field id="audit-from" label="From (UTC day)" type="date" value={draft.from} onChange={set("from")} error={errors.from} />
      <Field id="audit-to" label="To (UTC day, included)" type="date" value={draft.to} onChange={set("to")} error={errors.to} />
      <div className="lg:col-span-2">
        <SelectField id="audit-entity" label="Record kind" value={draft.entity} onChange={set("entity")} error={errors.entity}>
          <option value="">Any record</option>
          {Object.entries(RECORD_KINDS).map(([k, v]) => (
            <option key={k} value={k}>
              {v.label}
            </option>
          ))}
        </SelectField>
      </div>
      <div className="lg:col-span-2">
        <Field
          id="audit-record"
          label="Record id"
          value={draft.entityId}
          onChange={set("entityId")}
          error={errors.entityId}
          hint="The id in the record's address or in an event below."
        />
      </div>
      <div className="flex items-end gap-3 lg:col-span-2">
        <Button type="submit" disabled={busy}>
          {busy ? "Searching…" : "Show events"}
        </Button>
        <Button type="button" kind="secondary" onClick={() => apply(BLANK)}>
          Clear filters
        </Button>
      </div>
    </form>
  );
}
