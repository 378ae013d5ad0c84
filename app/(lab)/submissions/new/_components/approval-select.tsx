"use client";

import type { UseFormRegisterReturn } from "react-hook-form";
import { SelectField } from "@/components/ui/select-field";
import { useSubmissionPage } from "@/lib/submissions/hooks";

/** The approval submissions of the chosen organisation, for linking a surveillance submission. */
export function ApprovalSelect({ organisationId, error, registration }: { organisationId: string; error?: string; registration: UseFormRegisterReturn }) {
  const search = new URLSearchParams({ kind: "approval", organisationId, pageSize: "100", sort: "reference", dir: "desc" }).toString();
  const approvals = useSubmissionPage(search, !!organisationId);
  const none = approvals.data && approvals.data.rows.length === 0;
  const hint = !organisationId
    ? "Choose the organisation first."
    : none
      ? "This organisation has no approval submission on record yet."
      : "The approval results of the same model are the comparison for this one.";
  return (
    <div className="md:col-span-2">
      <SelectField
        id="sub-approval"
        label="Approval submission of the same model"
        hint={hint}
        error={error ?? (approvals.isError ? approvals.error.message : undefined)}
        disabled={!organisationId || approvals.isPending}
        {...registration}
      >
        <option value="">Choose…</option>
        {approvals.data?.rows.map((s) => (
          <option key={s.id} value={s.id}>
            {s.reference} · {s.modelName}
          </option>
        ))}
      </SelectField>
    </div>
  );
}
